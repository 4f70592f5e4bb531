// How much coolant to drain and replace to bring a system to a target concentration: the usual
// fix when a refractometer shows the mix too weak (add concentrate) or too strong (add water).
import { CoolantInputError } from './errors.js';
import { freezePointOf } from './freeze-point.js';
import { readGlycol } from './glycol-options.js';
import type { Glycol } from './glycol-tables.js';
import { concentrationWarnings } from './recommended-concentration.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export interface MixAdjustmentOptions {
  readonly glycol: Glycol;
  /** Total coolant in the system: litres as a number, or typed such as "6 qt". */
  readonly systemLitres: QuantityInput;
  /** Present concentration, vol %. */
  readonly currentPercent: QuantityInput;
  /** Wanted concentration, vol %. */
  readonly targetPercent: QuantityInput;
  /**
   * Concentration of the liquid put in, vol %. Defaults to 100 (concentrate) when strengthening
   * and to 0 (water) when diluting.
   */
  readonly addPercent?: QuantityInput;
}

export interface MixAdjustmentResult {
  /** Litres of the present mix to drain. */
  readonly drainLitres: number;
  /** Litres of the add liquid to put back (equal to drainLitres: the system is refilled to level). */
  readonly addLitres: number;
  readonly addPercent: number;
  readonly addLiquid: 'concentrate' | 'premix' | 'water';
  /** Concentration after the exchange, from the volume balance. */
  readonly resultingPercent: number;
  /** Freezing point of the result from the handbook table, or null past the table. */
  readonly resultingFreezeCelsius: number | null;
  readonly basis: 'volume';
  readonly warnings: readonly CoolantWarning[];
  /** The balance used, for the screen to show. */
  readonly rule: string;
}

// Common practice: cars hold about 5–15 L, heavy trucks and coaches up to about 100–150 L. 500 L
// leaves room for the largest vehicles a workshop sees while refusing a misread figure.
export const MAX_SYSTEM_LITRES = 500;

const RULE =
  'Volume balance: drain x litres of the present mix (c %) from a system of V litres and refill with x litres at a %; the result is (c·(V − x) + a·x) / V. Percentages are by volume, and mixing is taken as adding volumes (real glycol–water mixes shrink slightly).';

/** Litres to drain and replace to move a system from `currentPercent` to `targetPercent` vol %. */
export function mixAdjustment(options: MixAdjustmentOptions): MixAdjustmentResult {
  const glycol = readGlycol(options.glycol);
  const system = toCanonical(options.systemLitres, 'volume', 'systemLitres');
  if (system <= 0) {
    throw new CoolantInputError(
      'systemLitres',
      'Enter the system capacity; it must be more than 0 litres.',
    );
  }
  if (system > MAX_SYSTEM_LITRES) {
    throw new CoolantInputError(
      'systemLitres',
      `${system.toPrecision(3)} L is more coolant than any road vehicle holds (cars about 5–15 L, heavy trucks and coaches up to about 100–150 L); check the capacity in the maker's data and the unit.`,
    );
  }
  const current = toCanonical(options.currentPercent, 'percentage', 'currentPercent');
  const target = toCanonical(options.targetPercent, 'percentage', 'targetPercent');
  const strengthening = target > current;
  const add =
    options.addPercent === undefined
      ? strengthening
        ? 100
        : 0
      : toCanonical(options.addPercent, 'percentage', 'addPercent');

  if (target === current) {
    return result(glycol, system, current, add, 0, target);
  }
  if (strengthening && add < target) {
    throw new CoolantInputError(
      'addPercent',
      `A ${add} % liquid cannot raise the system to ${target} %: the liquid added must be at least as strong as the target.`,
    );
  }
  if (!strengthening && add > target) {
    throw new CoolantInputError(
      'addPercent',
      `A ${add} % liquid cannot dilute the system to ${target} %: the liquid added must be at most as strong as the target.`,
    );
  }
  const drain = (system * (target - current)) / (add - current);
  return result(glycol, system, current, add, drain, target);
}

function result(
  glycol: Glycol,
  system: number,
  current: number,
  add: number,
  drain: number,
  target: number,
): MixAdjustmentResult {
  const resultingPercent = (current * (system - drain) + add * drain) / system;
  const warnings: CoolantWarning[] = [...concentrationWarnings(glycol, target)];
  if (drain > 0) {
    if (drain >= system * (1 - 1e-9)) {
      warnings.push(
        warning(
          'full-replacement',
          `Reaching ${target} % with a ${add} % liquid means replacing all the coolant: flush and refill instead.`,
        ),
      );
    } else if (drain > system / 2) {
      warnings.push(
        warning(
          'large-drain',
          'More than half the system is to be drained; a drain rarely empties the engine block, so drain what comes out, refill, mix and measure again.',
        ),
      );
    }
    warnings.push(
      warning(
        'mix-after-adjusting',
        'Run the engine to full operating temperature so the new liquid mixes, let it cool, then check the concentration and level again. Never open a hot, pressurised system.',
      ),
    );
  }
  const freeze = freezePointOf(glycol, resultingPercent, 'volume');
  warnings.push(...freeze.warnings.filter((w) => w.code === 'over-concentrated'));
  return {
    drainLitres: drain,
    addLitres: drain,
    addPercent: add,
    addLiquid: add === 0 ? 'water' : add === 100 ? 'concentrate' : 'premix',
    resultingPercent,
    resultingFreezeCelsius: freeze.celsius,
    basis: 'volume',
    warnings,
    rule: RULE,
  };
}
