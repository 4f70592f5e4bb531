// The mapping of columns to channels: the shape a person confirms in the short form, the
// proposal Heatpath makes from the header and the first readings, and the check of a mapping
// that comes back. Column indexes are 0-based, counted in the file's column order.
import { TemperatureLogError } from '../errors.js';
import type { LogLayout } from '../format/detect-layout.js';
import { looksNumeric } from '../format/number-value.js';
import { detectTimeFormat, readTime } from '../format/time-value.js';
import type { TimeFormat } from '../format/time-value.js';
import { COLUMN_ROLES, guessRole, isTemperatureRole, ROLE_LABELS } from './column-roles.js';
import type { ColumnRole } from './column-roles.js';
import { headerWords } from './header-words.js';
import { statedPlainTimeUnit, statedSpeedUnit, statedTemperatureUnit } from './stated-units.js';
import type { SpeedUnit, TemperatureUnit } from './stated-units.js';

export type PlainTimeUnit = Extract<TimeFormat, 'seconds' | 'milliseconds' | 'minutes'>;

/** Which column holds which channel, and the units the file's values are in. */
export interface ColumnMapping {
  readonly time: number;
  readonly coolant: number;
  readonly intakeAir?: number | null;
  readonly ambient?: number | null;
  readonly vehicleSpeed?: number | null;
  readonly engineSpeed?: number | null;
  readonly fanDuty?: number | null;
  /** Unit of every temperature column; needed when the header does not say. */
  readonly temperatureUnit?: TemperatureUnit;
  /** Unit of the vehicle-speed column; km/h when neither the header nor the mapping says. */
  readonly vehicleSpeedUnit?: SpeedUnit;
  /** Unit of plain-number times; seconds when neither the header nor the mapping says. */
  readonly timeUnit?: PlainTimeUnit;
}

/** A field of the mapping the form has to ask for or have confirmed. */
export type MappingField = ColumnRole | 'temperatureUnit';

/** One column as the form shows it. */
export interface CandidateColumn {
  readonly index: number;
  readonly header: string | null;
  /** The first few values, as written in the file. */
  readonly samples: readonly string[];
  readonly suggestedRole: ColumnRole | null;
  readonly looksLike: 'time' | 'number' | 'text' | 'empty';
  /** The time format most of its values read as, when they read as times. */
  readonly timeFormat: TimeFormat | null;
  /** Whether those times never go backwards in the first lines. */
  readonly inOrder: boolean;
  readonly statedUnit: TemperatureUnit | SpeedUnit | null;
}

export interface MappingProposal {
  readonly columns: readonly CandidateColumn[];
  readonly proposed: Partial<ColumnMapping>;
  /** Fields Heatpath could not settle from the file; empty when the file maps itself. */
  readonly unsure: readonly MappingField[];
  /** One sentence per unsure field, for the form. */
  readonly reasons: readonly string[];
}

const SAMPLE_COUNT = 5;

function columnValues(layout: LogLayout, index: number): string[] {
  return layout.sampleRows.map((r) => (r.cells[index] ?? '').trim());
}

function nonDecreasing(values: readonly string[], format: TimeFormat): boolean {
  let last = Number.NEGATIVE_INFINITY;
  let seen = 0;
  for (const v of values) {
    const t = readTime(v, format);
    if (Number.isNaN(t)) {
      return false;
    }
    // A clock passing midnight is not a reason to doubt the column.
    if (!(t >= last) && !(format === 'hh:mm:ss' && last - t > 12 * 3600)) {
      return false;
    }
    last = t;
    seen += 1;
  }
  return seen > 0;
}

function describeColumn(layout: LogLayout, index: number): CandidateColumn {
  const header = layout.headers[index] ?? null;
  const words = header === null ? [] : headerWords(header);
  const values = columnValues(layout, index);
  const filled = values.filter((v) => v !== '');
  const guess = guessRole(words);
  // Most values, not all: one bad value in the first lines is for the reader to refuse with
  // its line number, not a reason to ask a person to map the column.
  const timeFormat = detectTimeFormat(filled, statedPlainTimeUnit(words));
  const clockLike = timeFormat === 'mm:ss' || timeFormat === 'hh:mm:ss' || timeFormat === 'iso';
  const numeric = filled.filter(looksNumeric).length * 2 >= filled.length;
  let looksLike: CandidateColumn['looksLike'] = 'text';
  if (filled.length === 0) {
    looksLike = 'empty';
  } else if (clockLike) {
    looksLike = 'time';
  } else if (numeric) {
    looksLike = 'number';
  }
  const role = guess === 'temperature' ? null : guess;
  let statedUnit: CandidateColumn['statedUnit'] = null;
  if (role === 'vehicleSpeed') {
    statedUnit = statedSpeedUnit(words);
  } else if (role === null || role === 'coolant' || role === 'intakeAir' || role === 'ambient') {
    statedUnit = statedTemperatureUnit(words);
  }
  return {
    index,
    header,
    samples: values.slice(0, SAMPLE_COUNT),
    suggestedRole: role,
    looksLike,
    timeFormat,
    inOrder: timeFormat !== null && nonDecreasing(filled, timeFormat),
    statedUnit,
  };
}

/** The temperature unit the mapped temperature columns' headers agree on. */
export function agreedTemperatureUnit(
  columns: readonly CandidateColumn[],
  indexes: readonly (number | null | undefined)[],
): { unit: TemperatureUnit | null; conflict: boolean } {
  const units = new Set<TemperatureUnit>();
  for (const i of indexes) {
    const stated = i === null || i === undefined ? null : columns[i]?.statedUnit;
    if (stated === 'degC' || stated === 'degF') {
      units.add(stated);
    }
  }
  if (units.size === 1) {
    return { unit: [...units][0] ?? null, conflict: false };
  }
  return { unit: null, conflict: units.size > 1 };
}

/** What Heatpath proposes for each channel, and what it is unsure of. */
export function proposeMapping(layout: LogLayout): MappingProposal {
  const columns = Array.from({ length: layout.columnCount }, (_, i) => describeColumn(layout, i));
  const proposed: Record<string, number | string> = {};
  const unsure: MappingField[] = [];
  const reasons: string[] = [];
  const hasHeader = layout.headerLine !== null;

  if (!hasHeader) {
    reasons.push('The file has no header line, so Heatpath cannot tell which column is which.');
  }

  // Time: a column named as time whose values read as times; else the first column of times in
  // order (clock times before plain numbers, which a rising temperature can look like too).
  const namedTime = columns.filter((c) => c.suggestedRole === 'time' && c.timeFormat !== null);
  const anyTime = columns.filter((c) => c.timeFormat !== null && c.inOrder);
  const clockTime = anyTime.filter((c) => c.looksLike === 'time');
  const timeColumn = namedTime[0] ?? clockTime[0] ?? anyTime[0];
  if (timeColumn !== undefined) {
    proposed['time'] = timeColumn.index;
  }
  if (namedTime.length !== 1) {
    unsure.push('time');
    if (hasHeader) {
      reasons.push(
        namedTime.length === 0
          ? 'No column is named as the time of each reading.'
          : `Several columns could be the time: ${namedTime.map((c) => `"${c.header ?? ''}"`).join(', ')}.`,
      );
    }
  }

  for (const role of COLUMN_ROLES) {
    if (role === 'time') {
      continue;
    }
    const named = columns.filter(
      (c) => c.suggestedRole === role && c.looksLike === 'number' && c.index !== proposed['time'],
    );
    const generic =
      role === 'coolant'
        ? columns.filter(
            (c) =>
              c.suggestedRole === null &&
              c.looksLike === 'number' &&
              c.header !== null &&
              guessRole(headerWords(c.header)) === 'temperature',
          )
        : [];
    const pick = named[0] ?? generic[0];
    if (pick !== undefined) {
      proposed[role] = pick.index;
    }
    if (named.length > 1) {
      unsure.push(role);
      reasons.push(
        `Several columns could be the ${ROLE_LABELS[role]}: ${named.map((c) => `"${c.header ?? ''}"`).join(', ')}.`,
      );
    } else if (role === 'coolant' && named.length === 0) {
      unsure.push(role);
      if (hasHeader) {
        reasons.push(
          generic.length > 0
            ? `"${generic[0]?.header ?? ''}" may be the coolant temperature; its header does not say which temperature it is.`
            : 'No column is named as the coolant temperature.',
        );
      }
    }
  }

  const temperatureIndexes = COLUMN_ROLES.filter(isTemperatureRole).map((r) => {
    const v = proposed[r];
    return typeof v === 'number' ? v : null;
  });
  const agreed = agreedTemperatureUnit(columns, temperatureIndexes);
  if (agreed.unit !== null) {
    proposed['temperatureUnit'] = agreed.unit;
  } else {
    unsure.push('temperatureUnit');
    reasons.push(
      agreed.conflict
        ? 'The temperature headers name both °C and °F; say which unit the values are in.'
        : 'The header does not say whether temperatures are in °C or °F.',
    );
  }

  const speedIndex = proposed['vehicleSpeed'];
  const speedUnit = typeof speedIndex === 'number' ? columns[speedIndex]?.statedUnit : null;
  if (speedUnit === 'km/h' || speedUnit === 'mph') {
    proposed['vehicleSpeedUnit'] = speedUnit;
  }
  const timeIndex = proposed['time'];
  const timeFormat = typeof timeIndex === 'number' ? columns[timeIndex]?.timeFormat : null;
  if (timeFormat === 'milliseconds' || timeFormat === 'minutes') {
    proposed['timeUnit'] = timeFormat;
  }

  return {
    columns,
    proposed: proposed as MappingProposal['proposed'],
    unsure: hasHeader ? unsure : [...new Set<MappingField>(['time', 'coolant', ...unsure])],
    reasons,
  };
}

/** The roles a log may leave out: every role but time and coolant, in COLUMN_ROLES order. */
export type OptionalRole = Exclude<ColumnRole, 'time' | 'coolant'>;
export const OPTIONAL_ROLES: readonly OptionalRole[] = COLUMN_ROLES.filter(
  (role): role is OptionalRole => role !== 'time' && role !== 'coolant',
);

/** The mapping's column per role, for the roles it maps. */
export function mappedColumns(mapping: ColumnMapping): [ColumnRole, number][] {
  const out: [ColumnRole, number][] = [
    ['time', mapping.time],
    ['coolant', mapping.coolant],
  ];
  for (const role of OPTIONAL_ROLES) {
    const index = mapping[role];
    if (index !== null && index !== undefined) {
      out.push([role, index]);
    }
  }
  return out;
}

/** Refuses a mapping that names a column the file does not have, or one column twice. */
export function checkMapping(mapping: ColumnMapping, columnCount: number): void {
  const used = new Map<number, ColumnRole>();
  for (const [role, index] of mappedColumns(mapping)) {
    if (!Number.isInteger(index) || index < 0 || index >= columnCount) {
      throw new TemperatureLogError(
        'invalid-mapping',
        `The ${ROLE_LABELS[role]} is mapped to column index ${String(index)}, but the file has ${columnCount} columns (indexes 0 to ${columnCount - 1}).`,
      );
    }
    const other = used.get(index);
    if (other !== undefined) {
      throw new TemperatureLogError(
        'invalid-mapping',
        `Column index ${index} is mapped as both the ${ROLE_LABELS[other]} and the ${ROLE_LABELS[role]}.`,
      );
    }
    used.set(index, role);
  }
  if (
    mapping.temperatureUnit !== undefined &&
    !['degC', 'degF'].includes(mapping.temperatureUnit)
  ) {
    throw new TemperatureLogError('invalid-mapping', 'The temperature unit must be degC or degF.');
  }
  if (
    mapping.vehicleSpeedUnit !== undefined &&
    !['km/h', 'mph'].includes(mapping.vehicleSpeedUnit)
  ) {
    throw new TemperatureLogError('invalid-mapping', 'The vehicle-speed unit must be km/h or mph.');
  }
  if (
    mapping.timeUnit !== undefined &&
    !['seconds', 'milliseconds', 'minutes'].includes(mapping.timeUnit)
  ) {
    throw new TemperatureLogError(
      'invalid-mapping',
      'The time unit must be seconds, milliseconds or minutes.',
    );
  }
}
