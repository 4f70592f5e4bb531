// Reads a cooling-system pressure test (hand pump on the filler neck, cold stopped engine) into a
// verdict, so a technician records the same judgement whatever gauge unit they read. The
// thresholds live in `pressureHoldRule`, the one rule both this calculator and the shipped trees'
// formulas are built from, so the walk and the calculator cannot disagree.
import { CoolantInputError } from './errors.js';
import { capRatingWarning, checkCapRating } from './cap-rating.js';
import { formatFigure } from './display-rounding.js';
import { SYSTEM_PRESSURE_TEST } from './sources.js';
import type { SourceNote } from './sources.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export type PressureTestVerdict =
  'holds' | 'slow-leak' | 'fast-leak' | 'not-at-rating' | 'too-short' | 'pressure-rose';

/**
 * Heatpath's pressure-hold rule. The trade rule is "hold the cold system at the cap rating for
 * 10–30 min; the gauge should not fall" (common practice, no numeric allowable drop published), so
 * the numbers below are Heatpath's choices, each with its reason.
 */
export const pressureHoldRule = {
  /**
   * A fall (or rise) within this is "no change". Cooling-system tester dials are marked in steps
   * of about 0.1 bar / 1–2 psi and read to about half a step; 0.05 bar (≈ 0.7 psi) is the
   * smallest change a technician can tell from parallax and needle width. Counting a smaller
   * change as a leak would fail sound systems on reading error.
   */
  noChangeBar: 0.05,
  /**
   * A loss at this rate or faster is a fast (clear) leak: 0.02 bar/min is 0.2 bar — four times
   * the no-change band — in the shortest hold of 10 min, a needle visibly moving within a minute
   * or two and a leak that usually drips or hisses where it can be found by looking and
   * listening. Slower losses are a slow leak (dye, repeat longer).
   */
  fastLeakBarPerMinute: 0.02,
  /** The rule's shortest hold (10–30 min, common practice). */
  minimumMinutes: 10,
  /**
   * Test pressures stay at or below the cap's rating (trade brief); a start more than this
   * fraction above it is refused: pumping past the rating can burst a hose or crack a tank and
   * proves nothing the rating does not. 10 % leaves room for a pump stroke's overshoot and the
   * tester's own gauge tolerance.
   */
  maxOverRatingFraction: 0.1,
  /**
   * A start below this fraction of the rating does not load the seals as the running system
   * does; the test is repeated at the rating.
   */
  minStartFractionOfRating: 0.9,
} as const;

export type PressureHoldRule = typeof pressureHoldRule;

export interface PressureTestOptions {
  /** Gauge pressure at the start of the hold: bar, or typed such as "15 psi". */
  readonly startBar: QuantityInput;
  /** Gauge pressure at the end of the hold. */
  readonly endBar: QuantityInput;
  /** Length of the hold: minutes, or typed such as "0.5 h". */
  readonly minutes: QuantityInput;
  /** The pressure cap's rating, gauge. */
  readonly capRatingBar: QuantityInput;
}

export interface PressureTestRule {
  readonly text: string;
  readonly source: SourceNote;
  /** Heatpath's own thresholds, since no allowable drop is published. */
  readonly thresholds: PressureHoldRule;
}

export interface PressureTestResult {
  readonly verdict: PressureTestVerdict;
  /** start − end, bar; negative when pressure rose. */
  readonly dropBar: number;
  readonly dropBarPerMinute: number;
  readonly explanation: string;
  readonly rule: PressureTestRule;
  readonly warnings: readonly CoolantWarning[];
}

const R = pressureHoldRule;

// A day-long hold says more about the workshop's temperature swing than about the seals.
const MAX_MINUTES = 24 * 60;

const RULE: PressureTestRule = {
  text: `Pump the cold, stopped system to the cap rating (never more than ${R.maxOverRatingFraction * 100} % above it) and hold it for 10–30 min; the gauge should not fall. Heatpath counts a change within ${R.noChangeBar} bar as no change (gauge reading resolution), a loss of ${R.fastLeakBarPerMinute} bar/min or faster as a fast leak, and any other loss as a slow leak.`,
  source: SYSTEM_PRESSURE_TEST,
  thresholds: pressureHoldRule,
};

interface Readings {
  readonly start: number;
  readonly end: number;
  readonly minutes: number;
  readonly rating: number;
}

function readInputs(options: PressureTestOptions): Readings {
  const rating = checkCapRating(toCanonical(options.capRatingBar, 'pressure', 'capRatingBar'));
  const start = toCanonical(options.startBar, 'pressure', 'startBar');
  const end = toCanonical(options.endBar, 'pressure', 'endBar');
  const minutes = toCanonical(options.minutes, 'time', 'minutes');
  if (start <= 0) {
    throw new CoolantInputError(
      'startBar',
      'The test starts with the system pumped above 0 bar gauge.',
    );
  }
  if (exceeds(start, rating * (1 + R.maxOverRatingFraction))) {
    throw new CoolantInputError(
      'startBar',
      `The test started more than ${R.maxOverRatingFraction * 100} % above the ${bar(rating)} cap rating. Pumping past the rating can burst a hose or crack a tank and proves nothing: release the pressure slowly and repeat at the rating.`,
    );
  }
  if (end < 0) {
    throw new CoolantInputError(
      'endBar',
      'A pumped-up system cannot end below 0 bar gauge on the tester; check the reading.',
    );
  }
  if (end > rating * (1 + R.maxOverRatingFraction) + 1) {
    // A rise of a whole bar above the rating on a cold, stopped system is not physically
    // plausible: the cap would have opened long before.
    throw new CoolantInputError(
      'endBar',
      'The end pressure is far above the cap rating; the cap would have opened. Check the reading and the unit.',
    );
  }
  if (minutes <= 0) {
    throw new CoolantInputError(
      'minutes',
      'Enter how long the pressure was held; it must be more than 0 minutes.',
    );
  }
  if (minutes > MAX_MINUTES) {
    throw new CoolantInputError(
      'minutes',
      'Enter a hold of at most 24 hours; the rule asks 10–30 minutes, and over longer holds the workshop temperature moves the gauge.',
    );
  }
  return { start, end, minutes, rating };
}

// Readings are typed to two decimals, so 1.4 − 1.2 must meet a 0.2 threshold exactly; the
// fault-tree formulas compare with a tolerance for the same reason.
const EPSILON = 1e-9;
const exceeds = (value: number, limit: number): boolean => value > limit + EPSILON;
const reaches = (value: number, limit: number): boolean => value >= limit - EPSILON;

function bar(value: number): string {
  return formatFigure(value, 'pressure');
}

/** Verdict on a cooling-system pressure test. */
export function pressureTest(options: PressureTestOptions): PressureTestResult {
  const { start, end, minutes, rating } = readInputs(options);
  const drop = start - end;
  const rate = drop / minutes;
  const held = `${minutes.toFixed(0)} min`;
  const warnings: CoolantWarning[] = [
    warning(
      'test-warm-system',
      'Test a cold system: a warm one loses pressure as it cools and reads like a leak. Never open a hot, pressurised system.',
    ),
  ];
  const capWarning = capRatingWarning(rating);
  if (capWarning) warnings.push(capWarning);

  const base = { dropBar: drop, dropBarPerMinute: rate, rule: RULE, warnings };
  if (start < rating * R.minStartFractionOfRating) {
    return {
      ...base,
      verdict: 'not-at-rating',
      explanation: `The test started at ${bar(start)}, well below the ${bar(rating)} rating; pump to the rating and repeat.`,
    };
  }
  if (exceeds(-drop, R.noChangeBar)) {
    warnings.push(
      warning(
        'pressure-rose',
        'A stopped engine makes no combustion gas: pressure rising during a cold hold means the system is still warming (run recently, sun, a heat source nearby). Let it cool fully and repeat. Combustion gas shows with the engine running, often only under load — a block test checks for it.',
      ),
    );
    return {
      ...base,
      verdict: 'pressure-rose',
      explanation: `The pressure rose ${bar(-drop)} during the hold: the system was still warming, so the test cannot show a leak yet. Let it cool to workshop temperature and repeat.`,
    };
  }
  if (exceeds(drop, R.noChangeBar) && reaches(rate, R.fastLeakBarPerMinute)) {
    return {
      ...base,
      verdict: 'fast-leak',
      explanation: `The pressure fell ${bar(drop)} in ${held}: a clear leak. Look and listen for it now with the pressure on: hoses and clamps, pump weep hole, radiator tanks, heater core (damp carpet, misted glass).`,
    };
  }
  if (!exceeds(drop, R.noChangeBar) && minutes < R.minimumMinutes) {
    warnings.push(
      warning(
        'short-test',
        `Hold for at least ${R.minimumMinutes} min; a slow leak does not show in ${held}.`,
      ),
    );
    return {
      ...base,
      verdict: 'too-short',
      explanation: `No fall in ${held}, but the hold is shorter than the 10–30 min the test needs.`,
    };
  }
  if (exceeds(drop, R.noChangeBar)) {
    return {
      ...base,
      verdict: 'slow-leak',
      explanation: `The pressure fell ${bar(drop)} in ${held}: a slow leak. Look for damp or crusted joints; UV dye helps find it.`,
    };
  }
  return {
    ...base,
    verdict: 'holds',
    explanation: `The pressure held within ${R.noChangeBar} bar for ${held}.`,
  };
}
