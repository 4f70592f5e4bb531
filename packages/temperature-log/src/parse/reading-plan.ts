// Settles how every column will be read before the first reading is: which column is which
// channel, the time format and the units. Either the file and the caller's mapping settle it,
// or the answer is that a person has to map the columns.
import {
  agreedTemperatureUnit,
  checkMapping,
  OPTIONAL_ROLES,
  proposeMapping,
} from '../columns/column-mapping.js';
import type {
  CandidateColumn,
  ColumnMapping,
  MappingProposal,
  OptionalRole,
} from '../columns/column-mapping.js';
import { ROLE_LABELS } from '../columns/column-roles.js';
import { headerWords } from '../columns/header-words.js';
import { sourceSignature } from '../columns/source-signature.js';
import { statedPlainTimeUnit } from '../columns/stated-units.js';
import type { TemperatureUnit } from '../columns/stated-units.js';
import { TemperatureLogError } from '../errors.js';
import type { LogLayout } from '../format/detect-layout.js';
import { timeShapeOf } from '../format/time-value.js';
import type { TimeFormat } from '../format/time-value.js';
import type { TextEncodingName } from '../input/decode-text.js';
import type {
  DetectedFormat,
  NeedsMappingResult,
  ResolvedMapping,
  TemperatureSeries,
} from '../series/temperature-series.js';
import { IDENTITY_MAP } from '@heatpath/coolant';
import type { LinearMap } from '@heatpath/coolant';
import { speedToKph, temperatureToCelsius } from '../units/unit-conversion.js';
import { VALUE_BOUNDS } from './value-bounds.js';
import type { ValueBounds } from './value-bounds.js';

export type ChannelKey = keyof Pick<
  TemperatureSeries,
  'intakeAirC' | 'ambientC' | 'vehicleSpeedKph' | 'engineSpeedRpm' | 'fanDuty'
>;

const CHANNEL_KEYS: Readonly<Record<OptionalRole, ChannelKey>> = {
  intakeAir: 'intakeAirC',
  ambient: 'ambientC',
  vehicleSpeed: 'vehicleSpeedKph',
  engineSpeed: 'engineSpeedRpm',
  fanDuty: 'fanDuty',
};

export interface ColumnPlan {
  readonly index: number;
  /** How the column is named in messages: its header, or its position. */
  readonly name: string;
  readonly label: string;
  readonly map: LinearMap;
  readonly bounds: ValueBounds;
  /** The unit the file's values are in, as messages show it ("°F"). */
  readonly fileUnit: string;
}

export interface ChannelPlan extends ColumnPlan {
  readonly key: ChannelKey;
}

export interface ReadingPlan {
  readonly layout: LogLayout;
  readonly signature: string;
  readonly detected: DetectedFormat;
  readonly mapping: ResolvedMapping;
  readonly timeFormat: TimeFormat;
  readonly time: { readonly index: number; readonly name: string };
  readonly coolant: ColumnPlan;
  readonly channels: readonly ChannelPlan[];
  /** Fewest cells a line must have to hold every mapped column. */
  readonly minCells: number;
}

function columnName(columns: readonly CandidateColumn[], index: number): string {
  const header = columns[index]?.header;
  return header !== null && header !== undefined && header !== ''
    ? `column ${index + 1} ("${header}")`
    : `column ${index + 1}`;
}

function timeFormatOf(layout: LogLayout, mapping: ColumnMapping, name: string): TimeFormat {
  const header = layout.headers[mapping.time];
  const plainUnit =
    mapping.timeUnit ??
    (header === null || header === undefined
      ? 'seconds'
      : statedPlainTimeUnit(headerWords(header)));
  const first = layout.sampleRows.find((r) => (r.cells[mapping.time] ?? '').trim() !== '');
  if (first === undefined) {
    throw new TemperatureLogError('missing-value', `${name} has no time in the first lines.`, {
      line: layout.firstDataLine,
      column: mapping.time,
    });
  }
  const text = (first.cells[mapping.time] ?? '').trim();
  const shape = timeShapeOf(text);
  if (shape === null) {
    throw new TemperatureLogError(
      'bad-time',
      `${name}: "${text}" is not a time Heatpath reads (seconds, mm:ss, hh:mm:ss, or a date and time such as 2024-05-01T10:15:30).`,
      { line: first.line, column: mapping.time },
    );
  }
  return shape === 'plain' ? plainUnit : shape;
}

function detectedFormat(
  layout: LogLayout,
  encoding: TextEncodingName | null,
  timeFormat: TimeFormat | null,
  unit: TemperatureUnit | null,
): DetectedFormat {
  return {
    encoding,
    delimiter: layout.delimiter,
    decimal: layout.decimal,
    header: layout.headerLine !== null,
    headerLine: layout.headerLine,
    unitLine: layout.unitLine,
    preambleLines: layout.preambleLines,
    firstDataLine: layout.firstDataLine,
    columnCount: layout.columnCount,
    timeFormat,
    unit,
  };
}

function needsMapping(
  layout: LogLayout,
  encoding: TextEncodingName | null,
  proposal: MappingProposal,
  unsure: MappingProposal['unsure'],
  reasons: readonly string[],
  proposed: MappingProposal['proposed'],
  statedUnit: TemperatureUnit | null,
): NeedsMappingResult {
  const timeIndex = proposed.time;
  const timeFormat =
    timeIndex === undefined ? null : (proposal.columns[timeIndex]?.timeFormat ?? null);
  return {
    status: 'needs-mapping',
    sourceSignature: sourceSignature(layout),
    detected: detectedFormat(layout, encoding, timeFormat, statedUnit),
    columns: proposal.columns,
    proposed,
    unsure,
    reasons,
  };
}

function temperatureIndexes(mapping: ColumnMapping): (number | null | undefined)[] {
  return [mapping.coolant, mapping.intakeAir, mapping.ambient];
}

/**
 * The plan for reading the file, or the answer that a person has to map its columns. With no
 * `mapping`, a file maps itself only when its header names one time and one coolant column
 * (and at most one column per other channel) and states the temperature unit.
 */
export function planReading(
  layout: LogLayout,
  encoding: TextEncodingName | null,
  given: ColumnMapping | undefined,
): ReadingPlan | NeedsMappingResult {
  const proposal = proposeMapping(layout);
  let mapping: ColumnMapping;
  if (given === undefined) {
    const stated = proposal.proposed.temperatureUnit ?? null;
    if (proposal.unsure.length > 0) {
      return needsMapping(
        layout,
        encoding,
        proposal,
        proposal.unsure,
        proposal.reasons,
        proposal.proposed,
        stated,
      );
    }
    const { time, coolant } = proposal.proposed;
    if (time === undefined || coolant === undefined) {
      throw new Error('A proposal with nothing unsure names the time and coolant columns.');
    }
    mapping = { ...proposal.proposed, time, coolant };
  } else {
    checkMapping(given, layout.columnCount);
    mapping = given;
  }

  const stated = agreedTemperatureUnit(proposal.columns, temperatureIndexes(mapping));
  const temperatureUnit = mapping.temperatureUnit ?? stated.unit;
  if (temperatureUnit === null) {
    const { temperatureUnit: _omit, ...rest } = mapping;
    return needsMapping(
      layout,
      encoding,
      proposal,
      ['temperatureUnit'],
      [
        stated.conflict
          ? 'The temperature headers name both °C and °F; say which unit the values are in.'
          : 'The header does not say whether temperatures are in °C or °F.',
      ],
      rest,
      null,
    );
  }
  const speedIndex = mapping.vehicleSpeed;
  const statedSpeed =
    speedIndex === null || speedIndex === undefined
      ? null
      : proposal.columns[speedIndex]?.statedUnit;
  const vehicleSpeedUnit = mapping.vehicleSpeedUnit ?? (statedSpeed === 'mph' ? 'mph' : 'km/h');
  const resolved: ResolvedMapping = { ...mapping, temperatureUnit, vehicleSpeedUnit };

  const timeName = columnName(proposal.columns, mapping.time);
  const timeFormat = timeFormatOf(layout, mapping, timeName);
  const temperatureMap = temperatureToCelsius(temperatureUnit);
  const temperatureShown = temperatureUnit === 'degC' ? '°C' : '°F';

  const plan = (role: keyof typeof VALUE_BOUNDS, index: number): ColumnPlan => {
    const isTemperature = role === 'coolant' || role === 'intakeAir' || role === 'ambient';
    const isSpeed = role === 'vehicleSpeed';
    return {
      index,
      name: columnName(proposal.columns, index),
      label: ROLE_LABELS[role],
      map: isTemperature ? temperatureMap : isSpeed ? speedToKph(vehicleSpeedUnit) : IDENTITY_MAP,
      bounds: VALUE_BOUNDS[role],
      fileUnit: isTemperature
        ? temperatureShown
        : isSpeed
          ? vehicleSpeedUnit
          : VALUE_BOUNDS[role].unit,
    };
  };

  const channels: ChannelPlan[] = [];
  for (const role of OPTIONAL_ROLES) {
    const index = mapping[role];
    if (index !== null && index !== undefined) {
      channels.push({ ...plan(role, index), key: CHANNEL_KEYS[role] });
    }
  }
  const indexes = [mapping.time, mapping.coolant, ...channels.map((c) => c.index)];
  return {
    layout,
    signature: sourceSignature(layout),
    detected: detectedFormat(layout, encoding, timeFormat, stated.unit),
    mapping: resolved,
    timeFormat,
    time: { index: mapping.time, name: timeName },
    coolant: plan('coolant', mapping.coolant),
    channels,
    minCells: Math.max(...indexes) + 1,
  };
}
