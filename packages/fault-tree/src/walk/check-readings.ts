// Checks the readings entered for a measurement step and converts them to canonical units. Every
// reading is checked, so a form can mark each wrong box; range messages name the allowed range in
// the unit the person typed and in the canonical unit.
import type { MeasurementNode } from '../schema/tree-schema.js';
import { toCanonical } from '../units/convert-units.js';
import { formatRange, formatWithUnit } from '../units/format-value.js';
import { acceptsUnit, quantityInfo, unitSymbol } from '../units/quantities.js';
import type { UnitCode } from '../units/quantities.js';
import type { RejectionCode } from './rejection.js';
import type { Reading } from './walk-events.js';

export interface ReadingProblem {
  readonly code: RejectionCode;
  readonly input: string;
  readonly message: string;
}

export interface ReadingsCheck {
  /** The readings that passed, in canonical units. */
  readonly canonical: Readonly<Record<string, number>>;
  /** Empty when every reading passed. */
  readonly problems: readonly ReadingProblem[];
}

function unitList(units: readonly UnitCode[]): string {
  const shown = units.map((u) => unitSymbol(u) || 'plain numbers');
  return shown.length <= 1
    ? (shown[0] ?? '')
    : `${shown.slice(0, -1).join(', ')} or ${shown.at(-1) ?? ''}`;
}

/** Checks `readings` against the node's inputs; with `partial`, missing readings are not a problem. */
export function checkReadings(
  node: MeasurementNode,
  readings: Readonly<Record<string, Reading>>,
  partial = false,
): ReadingsCheck {
  const problems: ReadingProblem[] = [];
  const canonical: Record<string, number> = {};
  const known = new Set(node.inputs.map((input) => input.name));
  for (const name of Object.keys(readings)) {
    if (!known.has(name)) {
      problems.push({
        code: 'unexpected-reading',
        input: name,
        message: `"${name}" is not a reading of this step.`,
      });
    }
  }
  for (const input of node.inputs) {
    const reading = Object.hasOwn(readings, input.name) ? readings[input.name] : undefined;
    if (reading === undefined) {
      if (!partial) {
        problems.push({
          code: 'missing-reading',
          input: input.name,
          message: `Enter "${input.label}".`,
        });
      }
      continue;
    }
    if (!acceptsUnit(input.quantity, reading.unit)) {
      problems.push({
        code: 'unit-not-accepted',
        input: input.name,
        message: `"${input.label}" can be entered in ${unitList(quantityInfo[input.quantity].entryUnits)}, not ${unitSymbol(reading.unit) || 'a plain number'}.`,
      });
      continue;
    }
    if (!Number.isFinite(reading.value)) {
      problems.push({
        code: 'not-a-number',
        input: input.name,
        message: `"${input.label}" must be a number.`,
      });
      continue;
    }
    const value = toCanonical(reading.value, reading.unit, input.quantity);
    if (value < input.range.min || value > input.range.max) {
      const entered = formatWithUnit(reading.value, reading.unit);
      const shown =
        reading.unit === input.unit ? entered : `${entered} (${formatWithUnit(value, input.unit)})`;
      problems.push({
        code: 'out-of-range',
        input: input.name,
        message: `"${input.label}" must be ${formatRange(input.range, input.quantity, reading.unit)}; ${shown} is outside it.`,
      });
      continue;
    }
    canonical[input.name] = value;
  }
  return { canonical, problems };
}
