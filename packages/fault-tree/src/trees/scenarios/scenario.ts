// The shape of a scenario in the shipped trees' scenario bank: a realistic car with one true
// fault (or a healthy part that must not be blamed), told as a short story, and the answers a
// technician would give at each step the walk asks, keyed by step id in the order asked.
// Written to be read by a workshop lead, not only by the test that walks it.
import type { UnitCode } from '../../units/quantities.js';

/** A reading as the technician types it: value and unit, e.g. `[16, 'psi']`. */
export type ScenarioReading = readonly [number, UnitCode];

/**
 * The answer to one step: a choice id for a question, `'done'` or `'could-not-do'` for a
 * procedure, or the readings of a measurement by input name.
 */
export type ScenarioAnswer = string | Readonly<Record<string, ScenarioReading>>;

export interface Scenario {
  /** One line a lead recognises, e.g. "Shroud stuck out on a switchable pump". */
  readonly name: string;
  /** The car, what the customer said and what is really wrong, in a few sentences. */
  readonly story: string;
  /** The outcome id a skilled technician would accept for this car. */
  readonly expect: string;
  /** Findings that would be confidently wrong for this car (checked as well as `expect`). */
  readonly mustNotReach?: readonly string[];
  /** The answers, keyed by step id, in the order the walk asks them. */
  readonly answers: Readonly<Record<string, ScenarioAnswer>>;
}

export interface ScenarioBank {
  /** The shipped tree these scenarios walk. */
  readonly treeId: string;
  /**
   * For each expensive finding (pump, heater core, head gasket and the like): the confirming
   * checks, at least one of which every walk to that finding must pass through.
   */
  readonly confirmations: Readonly<Record<string, readonly string[]>>;
  readonly scenarios: readonly Scenario[];
}

/** Identity helper so a bank file is type-checked where it is written. */
export function scenarioBank(bank: ScenarioBank): ScenarioBank {
  return bank;
}
