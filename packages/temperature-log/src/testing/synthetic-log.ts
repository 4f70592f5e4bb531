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
// Scenario shapes (scenario-shapes.ts): a switchable pump's shroud releasing during the warm-up
// (a dip, then a slower climb), a gradual settle after the opening, heat soak after switch-off
// (with an engine-speed channel), and a logger started late so the log begins warm.
import {
  settleAt,
  soakAt,
  warmUpModel,
  type SyntheticSettle,
  type SyntheticShroud,
  type SyntheticSwitchOff,
} from './scenario-shapes.js';
import { gaussian, seededRandom } from './seeded-random.js';

export type { SyntheticSettle, SyntheticShroud, SyntheticSwitchOff } from './scenario-shapes.js';

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
  /** A switchable pump whose shroud releases during the warm-up. */
  readonly shroud?: SyntheticShroud;
  /** A gradual climb after the opening before the coolant levels. */
  readonly settle?: SyntheticSettle;
  /** The engine is switched off and the coolant soaks up heat. */
  readonly switchOff?: SyntheticSwitchOff;
  /** Write an engine-speed channel (0 in the lead-in and after switch-off). Default: with a switch-off. */
  readonly engineSpeed?: boolean;
  /** The logger was started this long into the model (a log that begins warm); times restart at 0. */
  readonly startLoggingAtSeconds?: number;
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
  /** The shroud's release, when the spec has one (times in the log's own seconds). */
  readonly shroudRelease: { seconds: number; c: number } | null;
  /** Whether the opening happens after the logger started. */
  readonly openingInLog: boolean;
}

export interface SyntheticLog {
  readonly times: number[];
  readonly coolantC: number[];
  readonly fanDuty: (number | null)[] | null;
  readonly ambientC: (number | null)[] | null;
  readonly engineSpeedRpm: (number | null)[] | null;
  readonly truth: SyntheticTruth;
}

// Engine speed while running in the synthetic logs, rpm: an invented steady part-load figure.
const RUNNING_RPM = 1800;

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
  const skip = spec.startLoggingAtSeconds ?? 0;
  const { startC: t0, closedAsymptoteC: tInf, openingC } = spec;
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
  const warmUp = warmUpModel({
    startC: t0,
    closedAsymptoteC: tInf,
    timeConstantSeconds: spec.timeConstantSeconds,
    openingC,
    ...(spec.shroud === undefined ? {} : { shroud: spec.shroud }),
  });
  const openAfter = warmUp.openAfter;
  const openingSeconds = leadIn + openAfter;
  const episodes = (spec.episodes ?? []).map((e) => ({ ...e, rate: (e.rampKPerMin ?? 3) / 60 }));
  const lowestRegulated = openingC + regulation.offsetK - regulation.amplitudeK;
  const settleRise = spec.settle?.riseK ?? 0;
  for (const e of episodes) {
    if (e.startSeconds - (threshold - lowestRegulated) / e.rate < openingSeconds) {
      throw new Error('An episode must start its ramp after the thermostat has opened.');
    }
    if (lowestRegulated + 2 * regulation.amplitudeK + settleRise >= threshold) {
      throw new Error('The regulated level must stay below the over-temperature threshold.');
    }
  }

  /** The noiseless model with the engine running, and whether the fan is on. */
  const runningAt = (t: number): { value: number; fanOn: boolean } => {
    if (t < leadIn) {
      return { value: t0, fanOn: false };
    }
    if (t < openingSeconds) {
      return { value: warmUp.valueAt(t - leadIn), fanOn: false };
    }
    const u = t - openingSeconds;
    const swing = swingAt(u, regulation);
    let value = openingC + regulation.offsetK + settleAt(spec.settle, u) + swing.value;
    // Episodes are laid over the regulated part only; their ramps start from it.
    for (const e of episodes) {
      const ramp = Math.min(
        e.peakC,
        threshold + e.rate * (t - e.startSeconds),
        threshold + e.rate * (e.startSeconds + e.durationSeconds - t),
      );
      value = Math.max(value, ramp);
    }
    return { value, fanOn: swing.falling };
  };
  const switchOff = spec.switchOff;
  const atSwitchOff = switchOff === undefined ? 0 : runningAt(switchOff.atSeconds).value;
  const withRpm = spec.engineSpeed ?? switchOff !== undefined;

  const random = seededRandom(spec.seed);
  const times: number[] = [];
  const coolantC: number[] = [];
  const fanDuty: (number | null)[] = [];
  const ambientC: (number | null)[] = [];
  const engineSpeedRpm: (number | null)[] = [];
  const count = Math.floor(spec.durationSeconds / interval) + 1;
  for (let k = 0; k < count; k += 1) {
    const t = k * interval;
    const stopped = switchOff !== undefined && t >= switchOff.atSeconds;
    const model = stopped
      ? { value: atSwitchOff + soakAt(switchOff, t - switchOff.atSeconds), fanOn: false }
      : runningAt(t);
    let value = model.value + gaussian(random, spec.noiseK ?? 0);
    if (spec.quantiseK !== undefined && spec.quantiseK > 0) {
      value = Math.round(value / spec.quantiseK) * spec.quantiseK;
    }
    if (t < skip) {
      continue; // The logger was not running yet (the noise is still drawn, so seeds agree).
    }
    times.push(t - skip);
    coolantC.push(value);
    fanDuty.push(fanMode === 'follows-swings' ? (model.fanOn ? 100 : 0) : 0);
    ambientC.push(spec.ambientC ?? null);
    engineSpeedRpm.push(stopped || t < leadIn ? 0 : RUNNING_RPM);
  }

  return {
    times,
    coolantC,
    fanDuty: fanMode === 'none' ? null : fanDuty,
    ambientC: spec.ambientC === undefined ? null : ambientC,
    engineSpeedRpm: withRpm ? engineSpeedRpm : null,
    truth: {
      warmUpStartSeconds: leadIn - skip,
      openingSeconds: openingSeconds - skip,
      openingC,
      warmUpSeconds: openAfter,
      averageRiseKPerMin: ((openingC - t0) / openAfter) * 60,
      initialRiseKPerMin: ((tInf - t0) / spec.timeConstantSeconds) * 60,
      episodes: episodes.map((e) => ({
        startSeconds: e.startSeconds - skip,
        durationSeconds: e.durationSeconds,
        peakC: Math.min(e.peakC, threshold + (e.rate * e.durationSeconds) / 2),
      })),
      swing:
        regulation.amplitudeK > 0
          ? { amplitudeK: 2 * regulation.amplitudeK, periodSeconds: regulation.periodSeconds }
          : null,
      regulatedC: openingC + regulation.offsetK + settleRise,
      shroudRelease:
        warmUp.release === null
          ? null
          : { seconds: leadIn + warmUp.release.after - skip, c: warmUp.release.c },
      openingInLog: openingSeconds >= skip,
    },
  };
}
