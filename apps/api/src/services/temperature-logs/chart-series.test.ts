// The chart's thinning: never more than the limit, the window's ends and every bucket's extremes
// kept (so a one-reading spike survives), other channels taken at the same readings, and a
// window short enough returned whole.
import { describe, expect, it } from 'vitest';
import { chartSeries } from './chart-series';
import { decodeChannel, encodeChannel } from './series-columns';
import type { StoredSeries } from './series-columns';

function series(count: number, value: (i: number) => number): StoredSeries {
  const times = Array.from({ length: count }, (_, i) => i * 0.5);
  return {
    times,
    coolantC: times.map((_, i) => value(i)),
    intakeAirC: null,
    ambientC: null,
    vehicleSpeedKph: times.map((_, i) => (i % 7 === 0 ? null : i)),
    engineSpeedRpm: null,
    fanDuty: null,
  };
}

describe('chartSeries', () => {
  it('returns a short log whole', () => {
    const s = series(500, (i) => 20 + i / 10);
    const chart = chartSeries(s, {});
    expect(chart).toMatchObject({ from: 0, to: 249.5, readingsInWindow: 500, downsampled: false });
    expect(chart.times).toEqual(s.times);
    expect(chart.vehicleSpeedKph).toEqual(s.vehicleSpeedKph);
  });

  it('thins 100,000 readings to at most 2,000 and keeps single-reading spikes and dips', () => {
    const s = series(100_000, (i) =>
      i === 61_234 ? 131 : i === 7_777 ? -12 : 90 + Math.sin(i / 50),
    );
    const chart = chartSeries(s, {});
    expect(chart.downsampled).toBe(true);
    expect(chart.times.length).toBeLessThanOrEqual(2000);
    expect(chart.times.length).toBeGreaterThan(1900);
    expect(chart.times[0]).toBe(0);
    expect(chart.times.at(-1)).toBe(s.times.at(-1));
    expect(Math.max(...chart.coolantC)).toBe(131);
    expect(Math.min(...chart.coolantC)).toBe(-12);
    expect(chart.times).toContain(61_234 * 0.5);
    // In time order, and the other channel read at the same readings.
    expect(chart.times.every((t, k) => k === 0 || t > chart.times[k - 1]!)).toBe(true);
    chart.times.forEach((t, k) => {
      const i = t / 0.5;
      expect(chart.vehicleSpeedKph![k]).toBe(s.vehicleSpeedKph![i]);
    });
  });

  it('cuts the asked window, clamped to the log, at full resolution when it fits', () => {
    const s = series(10_000, (i) => 80 + (i % 100));
    const chart = chartSeries(s, { from: 1000, to: 1100 });
    expect(chart).toMatchObject({
      from: 1000,
      to: 1100,
      readingsInWindow: 201,
      downsampled: false,
    });
    expect(chart.times[0]).toBe(1000);
    expect(chart.times.at(-1)).toBe(1100);
    const clamped = chartSeries(s, { from: 4900, to: 99_999, maxPoints: 50 });
    expect(clamped.to).toBe(4999.5);
    expect(clamped.times.length).toBeLessThanOrEqual(50);
  });

  it('stores channels as float64 with NaN for an empty cell', () => {
    const values = [1.5, null, -40, 123456.789, 0];
    expect(decodeChannel(encodeChannel(values))).toEqual(values);
    expect(encodeChannel(values).length).toBe(40);
  });
});
