// Synthetic temperature logs from a simple physical model, with the right analysis answers
// known by construction. Used by the tests and the benchmark; the data are invented.
//
// Model: the engine stands (coolant at the start temperature) for a lead-in, then warms with
// the thermostat shut as a first-order system,
//     T(t) = T∞ − (T∞ − T0)·e^(−t/τ),
// toward T∞, the temperature it would reach if the thermostat never opened. The thermostat
// opens when T reaches the opening temperature, at t_open = τ·ln((T∞ − T0)/(T∞ − T_open)), and
// from then on regulates: the coolant stays at the opening temperature (plus an offset) with an
// optional swing (a sine for a hunting thermostat, a slow-rise/fast-fall sawtooth for a cycling
// fan). The asymptote sits above the opening temperature; with T∞ equal to the set point the
// warm-up would approach it for ever and never open.
// Over-temperature episodes are laid over the regulated curve: a ramp at a fixed rate up to the
// peak, a hold, and a ramp down, placed so the coolant is at or above the threshold exactly from
// `startSeconds` for `durationSeconds`. Seeded Gaussian noise and rounding (a sensor that
// reports whole degrees) come last.
import { gaussian, seededRandom } from './seeded-random.js';

export interface SyntheticEpisode {
  /** When the coolant reaches the threshold, s. */
  readonly startSeconds: number;
  /** How long it stays at or above the threshold, s. */
  readonly durationSeconds: number;
  readonly peakC: number;
  /** Rate of the ramps up and down, K/min; default 3. */
  readonly rampKPerMin?: number;
}

export interface SyntheticRegulation {
  /** Regulated level above the opening temperature, K; default 0. */
  readonly offsetK?: number;
  /** Half the peak-to-trough swing, K; default 0 (flat). */
  readonly amplitudeK?: number;
  readonly periodSeconds?: number;
  /** 'sine': thermostat hunting; 'fan-sawtooth': slow rise with the fan off, fast fall with it on. */
  readonly shape?: 'sine' | 'fan-sawtooth';
}

export interface SyntheticLogSpec {
  readonly seed: number;
  readonly durationSeconds: number;
  readonly sampleIntervalSeconds?: number;
  /** Engine standing before the warm-up starts, s; default 0. */
  readonly leadInSeconds?: number;
  readonly startC: number;
  /** Where the warm-up would end with the thermostat shut (T∞), °C. */
  readonly closedAsymptoteC: number;
  readonly timeConstantSeconds: number;
  readonly openingC: number;
  readonly regulation?: SyntheticRegulation;
  readonly episodes?: readonly SyntheticEpisode[];
  /** Threshold the episodes are placed against, °C; default 110. */
  readonly overTemperatureC?: number;
  /** Standard deviation of the noise, K; default 0. */
  readonly noiseK?: number;
  /** Round readings to this step, K (1 for a whole-degree sensor); default none. */
  readonly quantiseK?: number;
  /** Fan channel: follows a fan sawtooth, stays off, or is absent. Default: follows for a sawtooth, else absent. */
  readonly fan?: 'follows-swings' | 'off' | 'none';
  /** Ambient channel at this constant temperature, °C; default absent. */
  readonly ambientC?: number;
}

export interface SyntheticTruth {
  readonly warmUpStartSeconds: number;
  readonly openingSeconds: number;
  readonly openingC: number;
  readonly warmUpSeconds: number;
  readonly averageRiseKPerMin: number;
  /** The model's fastest rise, at the start of the warm-up. */
  readonly initialRiseKPerMin: number;
  readonly episodes: readonly { startSeconds: number; durationSeconds: number; peakC: number }[];
  readonly swing: { amplitudeK: number; periodSeconds: number } | null;
  readonly regulatedC: number;
}

export interface SyntheticLog {
  readonly times: number[];
  readonly coolantC: number[];
  readonly fanDuty: (number | null)[] | null;
  readonly ambientC: (number | null)[] | null;
  readonly truth: SyntheticTruth;
}

const RISE_FRACTION = 2 / 3;

function swingAt(u: number, r: Required<SyntheticRegulation>): { value: number; falling: boolean } {
  if (r.amplitudeK === 0) {
    return { value: 0, falling: false };
  }
  if (r.shape === 'sine') {
    const phase = (2 * Math.PI * u) / r.periodSeconds;
    return { value: r.amplitudeK * Math.sin(phase), falling: Math.cos(phase) < 0 };
  }
  // Starts mid-rise so the curve is continuous at the opening.
  const p = (u / r.periodSeconds + RISE_FRACTION / 2) % 1;
  return p < RISE_FRACTION
    ? { value: -r.amplitudeK + (2 * r.amplitudeK * p) / RISE_FRACTION, falling: false }
    : {
        value: r.amplitudeK - (2 * r.amplitudeK * (p - RISE_FRACTION)) / (1 - RISE_FRACTION),
        falling: true,
      };
}

export function syntheticLog(spec: SyntheticLogSpec): SyntheticLog {
  const interval = spec.sampleIntervalSeconds ?? 1;
  const leadIn = spec.leadInSeconds ?? 0;
  const threshold = spec.overTemperatureC ?? 110;
  const { startC: t0, closedAsymptoteC: tInf, timeConstantSeconds: tau, openingC } = spec;
  if (!(tInf > openingC && openingC > t0)) {
    throw new Error('The model needs start < opening < closed-thermostat asymptote.');
  }
  const regulation: Required<SyntheticRegulation> = {
    offsetK: spec.regulation?.offsetK ?? 0,
    amplitudeK: spec.regulation?.amplitudeK ?? 0,
    periodSeconds: spec.regulation?.periodSeconds ?? 120,
    shape: spec.regulation?.shape ?? 'sine',
  };
  const fanMode =
    spec.fan ??
    (regulation.shape === 'fan-sawtooth' && regulation.amplitudeK > 0 ? 'follows-swings' : 'none');
  const openAfter = tau * Math.log((tInf - t0) / (tInf - openingC));
  const openingSeconds = leadIn + openAfter;
  const episodes = (spec.episodes ?? []).map((e) => ({ ...e, rate: (e.rampKPerMin ?? 3) / 60 }));
  const lowestRegulated = openingC + regulation.offsetK - regulation.amplitudeK;
  for (const e of episodes) {
    if (e.startSeconds - (threshold - lowestRegulated) / e.rate < openingSeconds) {
      throw new Error('An episode must start its ramp after the thermostat has opened.');
    }
    if (lowestRegulated + 2 * regulation.amplitudeK >= threshold) {
      throw new Error('The regulated level must stay below the over-temperature threshold.');
    }
  }

  const random = seededRandom(spec.seed);
  const times: number[] = [];
  const coolantC: number[] = [];
  const fanDuty: (number | null)[] = [];
  const ambientC: (number | null)[] = [];
  const count = Math.floor(spec.durationSeconds / interval) + 1;
  for (let k = 0; k < count; k += 1) {
    const t = k * interval;
    let value: number;
    let fanOn = false;
    if (t < leadIn) {
      value = t0;
    } else if (t < openingSeconds) {
      value = tInf - (tInf - t0) * Math.exp(-(t - leadIn) / tau);
    } else {
      const swing = swingAt(t - openingSeconds, regulation);
      value = openingC + regulation.offsetK + swing.value;
      fanOn = swing.falling;
    }
    // Episodes are laid over the regulated part only; their ramps start from it.
    for (const e of t < openingSeconds ? [] : episodes) {
      const ramp = Math.min(
        e.peakC,
        threshold + e.rate * (t - e.startSeconds),
        threshold + e.rate * (e.startSeconds + e.durationSeconds - t),
      );
      value = Math.max(value, ramp);
    }
    value += gaussian(random, spec.noiseK ?? 0);
    if (spec.quantiseK !== undefined && spec.quantiseK > 0) {
      value = Math.round(value / spec.quantiseK) * spec.quantiseK;
    }
    times.push(t);
    coolantC.push(value);
    fanDuty.push(fanMode === 'follows-swings' ? (fanOn ? 100 : 0) : 0);
    ambientC.push(spec.ambientC ?? null);
  }

  return {
    times,
    coolantC,
    fanDuty: fanMode === 'none' ? null : fanDuty,
    ambientC: spec.ambientC === undefined ? null : ambientC,
    truth: {
      warmUpStartSeconds: leadIn,
      openingSeconds,
      openingC,
      warmUpSeconds: openAfter,
      averageRiseKPerMin: ((openingC - t0) / openAfter) * 60,
      initialRiseKPerMin: ((tInf - t0) / tau) * 60,
      episodes: episodes.map((e) => ({
        startSeconds: e.startSeconds,
        durationSeconds: e.durationSeconds,
        peakC: Math.min(e.peakC, threshold + (e.rate * e.durationSeconds) / 2),
      })),
      swing:
        regulation.amplitudeK > 0
          ? { amplitudeK: 2 * regulation.amplitudeK, periodSeconds: regulation.periodSeconds }
          : null,
      regulatedC: openingC + regulation.offsetK,
    },
  };
}
