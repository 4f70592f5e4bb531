// Over-temperature episodes: stretches where the coolant stays at or above a threshold for at
// least a set time. The crossings are found on the evenly stepped series lightly smoothed (10 s
// moving average), so sensor noise and whole-degree steps around the threshold do not move the
// start and end; crossing times are interpolated between points. An episode ends only when the
// coolant falls a hysteresis below the threshold, so hovering at the threshold does not split
// one episode into many; its end is the last crossing back under the threshold. The peak is the
// highest raw reading within the episode: what the live data showed.
// With an engine-speed channel, only running counts: an episode ends at switch-off and none
// starts while the engine is stopped, because heat soak after switch-off raises the coolant
// without the engine running hot (cooling-diagnosis.md, traps; common practice).
import type { ResolvedAnalysisOptions } from './analysis-options.js';
import { STATUS } from './result-basis.js';
import type { ResultBasis } from './result-basis.js';
import { halfWidthFor, movingAverage } from './uniform-grid.js';
import type { UniformGrid } from './uniform-grid.js';

export interface OverTemperatureEpisode {
  readonly startSeconds: number;
  readonly endSeconds: number;
  readonly durationSeconds: number;
  readonly peakC: number;
  readonly peakAtSeconds: number;
  /** The log ended during the episode, so its end and duration are lower bounds. */
  readonly ongoingAtEnd: boolean;
}

export interface OverTemperatureResult {
  readonly thresholdC: number;
  readonly minEpisodeSeconds: number;
  readonly episodes: readonly OverTemperatureEpisode[];
  readonly basis: ResultBasis;
}

function crossing(t0: number, v0: number, t1: number, v1: number, level: number): number {
  return v1 === v0 ? t1 : t0 + ((level - v0) * (t1 - t0)) / (v1 - v0);
}

function rawPeak(
  times: readonly number[],
  coolantC: readonly number[],
  from: number,
  to: number,
): { peakC: number; peakAtSeconds: number } {
  let peakC = Number.NEGATIVE_INFINITY;
  let peakAtSeconds = from;
  for (let i = 0; i < times.length; i += 1) {
    const t = times[i] ?? 0;
    if (t < from) {
      continue;
    }
    if (t > to) {
      break;
    }
    const v = coolantC[i] ?? Number.NEGATIVE_INFINITY;
    if (v > peakC) {
      peakC = v;
      peakAtSeconds = t;
    }
  }
  return { peakC, peakAtSeconds };
}

export function findOverTemperature(
  grid: UniformGrid,
  times: readonly number[],
  coolantC: readonly number[],
  o: ResolvedAnalysisOptions,
  /** Per grid point, 1 while the engine runs; null without an engine-speed channel. */
  running: Uint8Array | null = null,
): OverTemperatureResult {
  const threshold = o.overTemperatureC;
  const release = threshold - o.episodeHysteresisK;
  const s = movingAverage(grid.values, halfWidthFor(o.episodeSmoothingSeconds, grid.step));
  const timeAt = (k: number): number => grid.start + k * grid.step;
  const spans: { start: number; end: number; ongoing: boolean }[] = [];
  let start: number | null = null;
  let lastAbove = 0;
  for (let k = 0; k < s.length; k += 1) {
    const v = s[k] ?? Number.NaN;
    if (running !== null && running[k] === 0) {
      if (start !== null) {
        // Switched off during the episode: it ends there, and what follows is heat soak.
        const a = lastAbove;
        const end =
          a === k - 1
            ? timeAt(k)
            : crossing(timeAt(a), s[a] ?? v, timeAt(a + 1), s[a + 1] ?? v, threshold);
        spans.push({ start, end, ongoing: false });
        start = null;
      }
      continue;
    }
    if (start === null) {
      if (v >= threshold) {
        start =
          k === 0 ? timeAt(0) : crossing(timeAt(k - 1), s[k - 1] ?? v, timeAt(k), v, threshold);
        lastAbove = k;
      }
      continue;
    }
    if (v >= threshold) {
      lastAbove = k;
    } else if (v < release) {
      const a = lastAbove;
      const end = crossing(timeAt(a), s[a] ?? v, timeAt(a + 1), s[a + 1] ?? v, threshold);
      spans.push({ start, end, ongoing: false });
      start = null;
    }
  }
  if (start !== null) {
    spans.push({ start, end: timeAt(s.length - 1), ongoing: true });
  }

  const episodes = spans
    .filter((e) => e.end - e.start >= o.minEpisodeSeconds)
    .map((e) => ({
      startSeconds: e.start,
      endSeconds: e.end,
      durationSeconds: e.end - e.start,
      ...rawPeak(times, coolantC, e.start, e.end),
      ongoingAtEnd: e.ongoing,
    }));

  const smoothing =
    o.episodeSmoothingSeconds > 0
      ? `the coolant temperature (${o.episodeSmoothingSeconds} s moving average)`
      : 'the coolant readings';
  return {
    thresholdC: threshold,
    minEpisodeSeconds: o.minEpisodeSeconds,
    episodes,
    basis: {
      method: `Stretches where ${smoothing} is at or above ${threshold} °C for at least ${o.minEpisodeSeconds} s; an episode ends when it falls below ${release} °C (a ${o.episodeHysteresisK} K hysteresis), at its last crossing back under ${threshold} °C. Start and end are interpolated; the peak is the highest single reading in the episode.${running === null ? '' : ' Only while the engine runs (engine-speed channel): heat soak after switch-off is left out.'}`,
      status:
        o.mapControlledThermostat === true
          ? STATUS.heatpathThresholdMapControlled
          : STATUS.heatpathThreshold,
    },
  };
}
