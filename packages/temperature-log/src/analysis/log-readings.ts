// Values read off the log directly: the peak, when the coolant first reached a target
// temperature, the settled temperature after the opening, and the ambient temperature. With an
// engine-speed channel, the peak and the settled temperature use only readings while the engine
// runs: heat soak after switch-off is not the engine running hot (cooling-diagnosis.md, traps).
import type { ResolvedAnalysisOptions } from './analysis-options.js';
import type { EngineRunning } from './engine-running.js';
import type { OverTemperatureEpisode } from './over-temperature.js';
import { STATUS } from './result-basis.js';
import type { ResultBasis } from './result-basis.js';
import type { NotFound } from './warm-up.js';

export interface PeakResult {
  readonly valueC: number;
  readonly atSeconds: number;
  readonly basis: ResultBasis;
}

export type TimeToTargetResult =
  | {
      readonly found: true;
      readonly targetC: number;
      readonly seconds: number;
      readonly basis: ResultBasis;
    }
  | (NotFound & { readonly targetC: number });

export type SettledResult =
  | {
      readonly found: true;
      readonly medianC: number;
      readonly fromSeconds: number;
      readonly toSeconds: number;
      readonly basis: ResultBasis;
    }
  | NotFound;

export type AmbientResult =
  { readonly found: true; readonly medianC: number; readonly basis: ResultBasis } | NotFound;

function median(values: number[]): number {
  values.sort((a, b) => a - b);
  const mid = Math.floor(values.length / 2);
  return values.length % 2 === 1
    ? (values[mid] ?? Number.NaN)
    : ((values[mid - 1] ?? Number.NaN) + (values[mid] ?? Number.NaN)) / 2;
}

function round1(v: number): number {
  return Math.round(v * 10) / 10;
}

export function findPeak(
  times: readonly number[],
  coolantC: readonly number[],
  running: EngineRunning,
): PeakResult {
  // A log with the engine stopped throughout still has a highest reading.
  const anyRunning = running.atReading.some(Boolean);
  const counts = (i: number): boolean => !anyRunning || running.atReading[i] !== false;
  let best = -1;
  for (let i = 0; i < coolantC.length; i += 1) {
    if (
      counts(i) &&
      (best === -1 ||
        (coolantC[i] ?? Number.NEGATIVE_INFINITY) > (coolantC[best] ?? Number.NEGATIVE_INFINITY))
    ) {
      best = i;
    }
  }
  return {
    valueC: coolantC[best] ?? Number.NaN,
    atSeconds: times[best] ?? Number.NaN,
    basis: {
      method: running.known
        ? 'The highest coolant reading while the engine runs (engine-speed channel), and its time; heat soak after switch-off is left out.'
        : 'The highest coolant reading in the log, and its time.',
      status: STATUS.readFromLog,
    },
  };
}

export function findTimeToTarget(
  times: readonly number[],
  coolantC: readonly number[],
  o: ResolvedAnalysisOptions,
): TimeToTargetResult {
  const target = o.warmUpTargetC;
  const basis: ResultBasis = {
    method: `Time from the first reading to the first reading at or above ${target} °C, interpolated between readings.`,
    status: 'Read from the log; the log is taken to start with the engine start.',
  };
  const first = coolantC[0] ?? Number.NaN;
  if (first >= target) {
    return {
      found: false,
      targetC: target,
      reason: `The log starts at ${round1(first)} °C, already at or above ${target} °C.`,
      basis,
    };
  }
  for (let i = 1; i < coolantC.length; i += 1) {
    const v = coolantC[i] ?? Number.NaN;
    if (v >= target) {
      const pv = coolantC[i - 1] ?? v;
      const pt = times[i - 1] ?? 0;
      const t = times[i] ?? 0;
      const at = v === pv ? t : pt + ((target - pv) * (t - pt)) / (v - pv);
      return { found: true, targetC: target, seconds: at - (times[0] ?? 0), basis };
    }
  }
  let highest = Number.NEGATIVE_INFINITY;
  for (const v of coolantC) {
    highest = Math.max(highest, v);
  }
  const minutes = ((times[times.length - 1] ?? 0) - (times[0] ?? 0)) / 60;
  return {
    found: false,
    targetC: target,
    reason: `The coolant never reached ${target} °C in this ${round1(minutes)}-minute log (highest ${round1(highest)} °C).`,
    basis,
  };
}

export function findSettled(
  times: readonly number[],
  coolantC: readonly number[],
  fromSeconds: number | null,
  episodes: readonly OverTemperatureEpisode[],
  o: ResolvedAnalysisOptions,
  running: EngineRunning,
): SettledResult {
  const basis: ResultBasis = {
    method: `The median coolant reading from ${o.settleDelaySeconds} s after the thermostat opened to the end of the log, leaving out over-temperature episodes${running.known ? ' and readings with the engine stopped' : ''}; it needs at least ${o.minSettledSeconds / 60} minutes of log after the opening.`,
    status: `${STATUS.heatpathMethod} The log does not say whether the car was driven steadily; check the chart.`,
  };
  if (fromSeconds === null) {
    return {
      found: false,
      reason: 'No thermostat opening was found, so Heatpath cannot tell when the coolant settled.',
      basis,
    };
  }
  const start = fromSeconds + o.settleDelaySeconds;
  const end = times[times.length - 1] ?? 0;
  if (end - start < o.minSettledSeconds) {
    return {
      found: false,
      reason: `The log runs only ${round1(Math.max(0, end - fromSeconds) / 60)} minutes past the opening; the settled temperature needs ${round1((o.minSettledSeconds + o.settleDelaySeconds) / 60)}.`,
      basis,
    };
  }
  const values: number[] = [];
  let e = 0;
  for (let i = 0; i < times.length; i += 1) {
    const t = times[i] ?? 0;
    if (t < start || running.atReading[i] === false) {
      continue;
    }
    while (e < episodes.length && (episodes[e]?.endSeconds ?? 0) < t) {
      e += 1;
    }
    const ep = episodes[e];
    if (ep !== undefined && t >= ep.startSeconds && t <= ep.endSeconds) {
      continue;
    }
    values.push(coolantC[i] ?? 0);
  }
  if (values.length === 0) {
    return {
      found: false,
      reason: 'The coolant was over temperature for the whole time after the opening.',
      basis,
    };
  }
  return { found: true, medianC: median(values), fromSeconds: start, toSeconds: end, basis };
}

export function findAmbient(
  ambientC: readonly (number | null)[] | null | undefined,
): AmbientResult {
  const basis: ResultBasis = {
    method: 'The median of the log’s ambient-temperature channel.',
    status:
      'Read from the log; the car’s ambient sensor reads high in slow traffic and after standing in the sun.',
  };
  const values = (ambientC ?? []).filter((v): v is number => v !== null);
  if (values.length === 0) {
    return { found: false, reason: 'The log has no ambient-temperature channel.', basis };
  }
  return { found: true, medianC: median(values), basis };
}
