// The readings the chart draws. A window (the whole log, or the stretch a person zoomed to) with
// more readings than the chart can show is thinned by min/max buckets: the window is cut into
// equal stretches of time and each keeps its coldest and hottest coolant reading, in time order,
// plus the window's first and last reading. Peaks and dips therefore survive thinning (an episode
// never disappears from the chart), which an every-nth-reading sample would not promise. The other
// channels are taken at the same readings.
import type { ChartSeries } from '@heatpath/contracts';
import { chartMaxPoints } from '@heatpath/contracts';
import type { StoredSeries } from './series-columns';
import { logChannels } from './series-columns';

/** First index whose time is after t, or at or after it with `orEqual` (times never decrease). */
function firstIndex(times: readonly number[], t: number, orEqual: boolean): number {
  let lo = 0;
  let hi = times.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    const value = times[mid] ?? Number.POSITIVE_INFINITY;
    if (value < t || (!orEqual && value === t)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function pickIndexes(series: StoredSeries, first: number, last: number, maxPoints: number) {
  const count = last - first + 1;
  if (count <= maxPoints) {
    return Array.from({ length: Math.max(0, count) }, (_, k) => first + k);
  }
  const { times, coolantC } = series;
  const start = times[first] ?? 0;
  const span = (times[last] ?? start) - start;
  // Two readings per bucket, plus the window's first and last.
  const buckets = Math.max(1, Math.floor((maxPoints - 2) / 2));
  const picked: number[] = [first];
  let i = first + 1;
  for (let b = 0; b < buckets && i < last; b += 1) {
    const end = b === buckets - 1 ? (times[last] ?? start) : start + (span * (b + 1)) / buckets;
    let minAt = -1;
    let maxAt = -1;
    for (; i < last && (times[i] ?? end) < end; i += 1) {
      const v = coolantC[i] ?? 0;
      if (minAt < 0 || v < (coolantC[minAt] ?? v)) minAt = i;
      if (maxAt < 0 || v > (coolantC[maxAt] ?? v)) maxAt = i;
    }
    if (minAt < 0) continue;
    if (minAt === maxAt) picked.push(minAt);
    else picked.push(Math.min(minAt, maxAt), Math.max(minAt, maxAt));
  }
  picked.push(last);
  return picked;
}

export function chartSeries(
  series: StoredSeries,
  window: { from?: number | undefined; to?: number | undefined; maxPoints?: number | undefined },
): ChartSeries {
  const { times } = series;
  const maxPoints = window.maxPoints ?? chartMaxPoints;
  const logEnd = times[times.length - 1] ?? 0;
  const from = Math.max(0, Math.min(window.from ?? 0, logEnd));
  const to = Math.min(logEnd, Math.max(window.to ?? logEnd, from));
  const first = firstIndex(times, from, true);
  const last = Math.max(first, firstIndex(times, to, false) - 1);
  const readingsInWindow = first < times.length ? last - first + 1 : 0;
  const indexes = readingsInWindow === 0 ? [] : pickIndexes(series, first, last, maxPoints);
  const at = <T>(values: readonly T[]) => indexes.map((k) => values[k] as T);
  const channels = Object.fromEntries(
    logChannels.map((channel) => {
      const values = series[channel];
      return [channel, values === null ? null : at(values)];
    }),
  ) as Pick<ChartSeries, (typeof logChannels)[number]>;
  return {
    from,
    to,
    readingsInWindow,
    downsampled: indexes.length < readingsInWindow,
    maxPoints,
    times: at(times),
    coolantC: at(series.coolantC),
    ...channels,
  };
}
