// Runs a coolant computation live as a person types: waits quietly while required boxes are
// empty, and turns the package's CoolantInputError into a message for the box it names.
import { CoolantInputError } from '@heatpath/coolant';

export type Calculation<R> =
  | { state: 'waiting'; missing: readonly string[] }
  | { state: 'done'; result: R }
  | { state: 'refused'; field: string | null; message: string };

export interface RequiredInput {
  /** The coolant option this box feeds, e.g. "inletCelsius". */
  field: string;
  /** The box's label, to say what is still missing. */
  label: string;
  value: string;
}

export function calculate<R>(required: readonly RequiredInput[], compute: () => R): Calculation<R> {
  const missing = required.filter((input) => input.value.trim() === '').map((i) => i.label);
  if (missing.length > 0) return { state: 'waiting', missing };
  try {
    return { state: 'done', result: compute() };
  } catch (error) {
    // The package names the option at fault; the screen puts the message beside that box.
    if (error instanceof CoolantInputError) {
      return { state: 'refused', field: error.field, message: error.message };
    }
    return {
      state: 'refused',
      field: null,
      message: 'These readings cannot be worked out. Check each box and try again.',
    };
  }
}

/** The message for one box, if the computation refused because of it. */
export function errorFor(calculation: Calculation<unknown>, field: string): string | undefined {
  return calculation.state === 'refused' && calculation.field === field
    ? calculation.message
    : undefined;
}
