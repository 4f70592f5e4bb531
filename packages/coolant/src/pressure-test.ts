// Reads a cooling-system pressure test (hand pump on the filler neck, cold engine) into a verdict,
// so a technician records the same judgement whatever gauge unit they read.
import { CoolantInputError } from './errors.js';
import { CAP_RATING_TYPICAL, SYSTEM_PRESSURE_TEST } from './sources.js';
import type { SourceNote } from './sources.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export type PressureTestVerdict =
  'holds' | 'slow-leak' | 'fast-leak' | 'not-at-rating' | 'too-short' | 'pressure-rose';

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
  readonly thresholds: {
    readonly readingResolutionBar: number;
    readonly fastLeakBarPerMinute: number;
    readonly minimumMinutes: number;
    readonly startAtLeastFractionOfRating: number;
  };
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

// A tester's dial is read to about half a psi; a change smaller than this is not a reading.
const READING_RESOLUTION_BAR = 0.05;
// Losing a tenth of a bar a minute empties a typical cap rating within ten minutes: a leak that
// should be seen or heard.
const FAST_LEAK_BAR_PER_MINUTE = 0.1;
const MINIMUM_MINUTES = 10;
// Starting well below the rating does not load the seals as the running system does.
const START_FRACTION_OF_RATING = 0.9;

const RULE: PressureTestRule = {
  text: `Pump the cold system to the cap rating and hold it for 10–30 min; the gauge should not fall. Heatpath treats a change within ${READING_RESOLUTION_BAR} bar as no change (gauge reading resolution), a loss of ${FAST_LEAK_BAR_PER_MINUTE} bar/min or more as a fast leak, and any other loss as a slow leak.`,
  source: SYSTEM_PRESSURE_TEST,
  thresholds: {
    readingResolutionBar: READING_RESOLUTION_BAR,
    fastLeakBarPerMinute: FAST_LEAK_BAR_PER_MINUTE,
    minimumMinutes: MINIMUM_MINUTES,
    startAtLeastFractionOfRating: START_FRACTION_OF_RATING,
  },
};

/** Verdict on a cooling-system pressure test. */
export function pressureTest(options: PressureTestOptions): PressureTestResult {
  const start = toCanonical(options.startBar, 'pressure', 'startBar');
  const end = toCanonical(options.endBar, 'pressure', 'endBar');
  const minutes = toCanonical(options.minutes, 'duration', 'minutes');
  const rating = toCanonical(options.capRatingBar, 'pressure', 'capRatingBar');
  if (rating <= 0) {
    throw new CoolantInputError(
      'capRatingBar',
      'Enter the cap rating as a gauge pressure above 0 bar.',
    );
  }
  if (start <= 0) {
    throw new CoolantInputError(
      'startBar',
      'The test starts with the system pumped above 0 bar gauge.',
    );
  }
  if (end < 0) {
    throw new CoolantInputError(
      'endBar',
      'A pumped-up system cannot end below 0 bar gauge on the tester; check the reading.',
    );
  }
  if (minutes <= 0) {
    throw new CoolantInputError(
      'minutes',
      'Enter how long the pressure was held; it must be more than 0 minutes.',
    );
  }

  const drop = start - end;
  const rate = drop / minutes;
  const warnings: CoolantWarning[] = [
    warning(
      'test-warm-system',
      'Test a cold system: a warm one loses pressure as it cools and reads like a leak. Never open a hot, pressurised system.',
    ),
  ];
  if (rating < 0.8 || rating > 1.2) {
    warnings.push(
      warning(
        'unusual-cap-rating',
        `A ${rating.toFixed(2)} bar cap is outside the typical 0.8–1.2 bar (${CAP_RATING_TYPICAL.status}); check the figure stamped on the cap or the maker's data.`,
      ),
    );
  }
  if (start > rating * 1.1) {
    warnings.push(
      warning(
        'above-cap-rating',
        'The test started more than 10 % above the cap rating; pumping past the rating can damage the radiator or heater core.',
      ),
    );
  }

  const base = { dropBar: drop, dropBarPerMinute: rate, rule: RULE, warnings };
  if (start < rating * START_FRACTION_OF_RATING) {
    return {
      ...base,
      verdict: 'not-at-rating',
      explanation: `The test started at ${start.toFixed(2)} bar, well below the ${rating.toFixed(2)} bar rating; pump to the rating and repeat.`,
    };
  }
  if (-drop > READING_RESOLUTION_BAR) {
    warnings.push(
      warning(
        'pressure-rose',
        'Pressure rising on a cold, stopped engine means gas is getting in: suspect combustion gas (head gasket, EGR cooler) and run a block test.',
      ),
    );
    return {
      ...base,
      verdict: 'pressure-rose',
      explanation: `The pressure rose by ${(-drop).toFixed(2)} bar during the hold.`,
    };
  }
  if (rate >= FAST_LEAK_BAR_PER_MINUTE && drop > READING_RESOLUTION_BAR) {
    return {
      ...base,
      verdict: 'fast-leak',
      explanation: `The pressure fell ${drop.toFixed(2)} bar in ${minutes.toFixed(1)} min (${rate.toFixed(2)} bar/min): look and listen for the leak now; hoses, pump weep hole, radiator tanks, heater core.`,
    };
  }
  if (minutes < MINIMUM_MINUTES && drop <= READING_RESOLUTION_BAR) {
    warnings.push(
      warning(
        'short-test',
        `Hold for at least ${MINIMUM_MINUTES} min; a slow leak does not show in ${minutes.toFixed(1)} min.`,
      ),
    );
    return {
      ...base,
      verdict: 'too-short',
      explanation: `No fall in ${minutes.toFixed(1)} min, but the hold is shorter than the 10–30 min the test needs.`,
    };
  }
  if (drop > READING_RESOLUTION_BAR) {
    return {
      ...base,
      verdict: 'slow-leak',
      explanation: `The pressure fell ${drop.toFixed(2)} bar in ${minutes.toFixed(1)} min: a slow leak. Look for damp or crusted joints; UV dye helps find it.`,
    };
  }
  return {
    ...base,
    verdict: 'holds',
    explanation: `The pressure held within ${READING_RESOLUTION_BAR} bar for ${minutes.toFixed(1)} min.`,
  };
}
