// The analysis against synthetic logs from the physical model in testing/synthetic-log.ts, where
// the right answers are known by construction (opening time and temperature, episode start,
// duration and peak, swing amplitude and period). Tolerances allow for the seeded noise and the
// smoothing windows; each says why it is what it is.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { syntheticLog } from '../testing/synthetic-log.js';
import type { SyntheticLogSpec } from '../testing/synthetic-log.js';
import { analyseTemperatureLog } from './analyse-temperature-log.js';
import type { TemperatureLogAnalysis } from './analyse-temperature-log.js';

const BASE: SyntheticLogSpec = {
  seed: 20240601,
  durationSeconds: 2400,
  startC: 20,
  closedAsymptoteC: 125,
  timeConstantSeconds: 600,
  openingC: 88,
  noiseK: 0.3,
};

function opened(a: TemperatureLogAnalysis): { at: number; c: number } {
  if (!a.opening.found) {
    throw new Error(a.opening.reason);
  }
  return { at: a.opening.atSeconds, c: a.opening.temperatureC };
}

describe('warm-up and opening (Heatpath’s method against the first-order model)', () => {
  it('finds the opening where the model opens, within 15 s and 1 K', () => {
    const log = syntheticLog(BASE);
    const a = analyseTemperatureLog(log);
    // By construction: 600 s · ln(105 / 37) = 625.8 s.
    expect(log.truth.openingSeconds).toBeCloseTo(625.83, 2);
    const o = opened(a);
    expect(Math.abs(o.at - log.truth.openingSeconds)).toBeLessThanOrEqual(15);
    expect(Math.abs(o.c - log.truth.openingC)).toBeLessThanOrEqual(1);
    expect(
      a.warmUp.found && Math.abs(a.warmUp.seconds - log.truth.warmUpSeconds),
    ).toBeLessThanOrEqual(15);
    expect(a.warmUp.found && Math.abs(a.warmUp.startSeconds)).toBeLessThanOrEqual(10);
  });

  it('gives the model’s average rise rate within 0.3 K/min, and its fastest rise', () => {
    const log = syntheticLog(BASE);
    const a = analyseTemperatureLog(log);
    if (!a.riseRate.found) {
      throw new Error(a.riseRate.reason);
    }
    // (88 − 20) K over 625.8 s = 6.52 K/min.
    expect(Math.abs(a.riseRate.averageKPerMin - log.truth.averageRiseKPerMin)).toBeLessThanOrEqual(
      0.3,
    );
    // The fastest 60 s is the first: (T(60) − T(0)) / 1 min = 105 · (1 − e^(−0.1)) = 9.99 K/min.
    expect(a.riseRate.maxKPerMin).toBeGreaterThan(9.5);
    expect(a.riseRate.maxKPerMin).toBeLessThanOrEqual(log.truth.initialRiseKPerMin);
  });

  it('does not count a lead-in with the engine standing', () => {
    const log = syntheticLog({ ...BASE, leadInSeconds: 300, durationSeconds: 2700 });
    const a = analyseTemperatureLog(log);
    expect(a.warmUp.found && Math.abs(a.warmUp.startSeconds - 300)).toBeLessThanOrEqual(15);
    expect(
      a.warmUp.found && Math.abs(a.warmUp.seconds - log.truth.warmUpSeconds),
    ).toBeLessThanOrEqual(20);
  });

  it('reads a whole-degree sensor with more noise, within 30 s and 1.5 K', () => {
    const log = syntheticLog({ ...BASE, seed: 99, noiseK: 0.5, quantiseK: 1 });
    const o = opened(analyseTemperatureLog(log));
    expect(Math.abs(o.at - log.truth.openingSeconds)).toBeLessThanOrEqual(30);
    expect(Math.abs(o.c - log.truth.openingC)).toBeLessThanOrEqual(1.5);
  });

  it.each([0.5, 2, 5])('works at %d s between readings', (interval) => {
    const log = syntheticLog({ ...BASE, sampleIntervalSeconds: interval });
    const o = opened(analyseTemperatureLog(log));
    expect(Math.abs(o.at - log.truth.openingSeconds)).toBeLessThanOrEqual(15 + interval);
    expect(Math.abs(o.c - log.truth.openingC)).toBeLessThanOrEqual(1);
  });

  it('flags an opening below the usual 82–91 °C (a thermostat opening early)', () => {
    const a = analyseTemperatureLog(syntheticLog({ ...BASE, openingC: 72 }));
    expect(a.opening.found && a.opening.comparedWithTypical).toBe('below');
  });

  it('holds over random engines, noise and seeds', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 75, max: 95, noNaN: true }),
        fc.double({ min: 20, max: 40, noNaN: true }),
        fc.double({ min: 300, max: 900, noNaN: true }),
        fc.double({ min: 0, max: 0.4, noNaN: true }),
        (seed, startC, openingC, aboveK, tau, noiseK) => {
          const spec = {
            seed,
            startC,
            openingC,
            closedAsymptoteC: openingC + aboveK,
            timeConstantSeconds: tau,
            noiseK,
            durationSeconds: 3600,
          };
          const log = syntheticLog(spec);
          const o = opened(analyseTemperatureLog(log));
          expect(Math.abs(o.at - log.truth.openingSeconds)).toBeLessThanOrEqual(20);
          expect(Math.abs(o.c - log.truth.openingC)).toBeLessThanOrEqual(1);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('reports no warm-up for a log that starts warm', () => {
    const log = syntheticLog({ ...BASE, startC: 80, openingC: 88, closedAsymptoteC: 125 });
    const a = analyseTemperatureLog({
      times: log.times.slice(600),
      coolantC: log.coolantC.slice(600),
    });
    expect(a.warmUp.found).toBe(false);
    // It starts at the 88 °C it regulates at: above the 67 °C a warm-up has to start below.
    expect(!a.warmUp.found && a.warmUp.reason).toMatch(/already warm/);
    expect(a.opening.found).toBe(false);
  });

  it('reports a log that ends before the thermostat opens', () => {
    const log = syntheticLog({ ...BASE, durationSeconds: 500 });
    const a = analyseTemperatureLog(log);
    expect(!a.warmUp.found && a.warmUp.reason).toMatch(/still rising when the log ended/);
  });

  it('times the climb to 80 °C', () => {
    const log = syntheticLog(BASE);
    const a = analyseTemperatureLog(log);
    // 600 s · ln(105 / 45) = 508.4 s.
    expect(
      a.timeToTarget.found && Math.abs(a.timeToTarget.seconds - 600 * Math.log(105 / 45)),
    ).toBeLessThanOrEqual(10);
  });

  it('gives the settled temperature of a steady regulated stretch', () => {
    const log = syntheticLog({ ...BASE, regulation: { offsetK: 3 } });
    const a = analyseTemperatureLog(log);
    expect(
      a.settled.found && Math.abs(a.settled.medianC - log.truth.regulatedC),
    ).toBeLessThanOrEqual(0.2);
  });
});

describe('over-temperature episodes (known start, duration and peak)', () => {
  const spec: SyntheticLogSpec = {
    ...BASE,
    durationSeconds: 4000,
    episodes: [
      { startSeconds: 1500, durationSeconds: 240, peakC: 116 },
      { startSeconds: 2600, durationSeconds: 600, peakC: 121, rampKPerMin: 6 },
      // Above 110 °C for 20 s only: shorter than the 30 s minimum.
      { startSeconds: 3600, durationSeconds: 20, peakC: 112, rampKPerMin: 6 },
    ],
  };
  const log = syntheticLog(spec);
  const a = analyseTemperatureLog(log);

  it('finds the two long episodes and not the short one', () => {
    expect(a.overTemperature.episodes).toHaveLength(2);
    expect(
      analyseTemperatureLog(log, { minEpisodeSeconds: 10 }).overTemperature.episodes,
    ).toHaveLength(3);
  });

  it('gives each start within 10 s, duration within 15 s and peak within 1.5 K', () => {
    a.overTemperature.episodes.forEach((episode, k) => {
      const truth = log.truth.episodes[k];
      if (truth === undefined) {
        throw new Error('More episodes than the model made.');
      }
      expect(Math.abs(episode.startSeconds - truth.startSeconds)).toBeLessThanOrEqual(10);
      expect(Math.abs(episode.durationSeconds - truth.durationSeconds)).toBeLessThanOrEqual(15);
      // The peak is the highest raw reading: the plateau plus the largest of the noise.
      expect(Math.abs(episode.peakC - truth.peakC)).toBeLessThanOrEqual(1.5);
      expect(episode.ongoingAtEnd).toBe(false);
    });
  });

  it('finds none below the threshold, and more when the threshold is lower', () => {
    expect(analyseTemperatureLog(syntheticLog(BASE)).overTemperature.episodes).toEqual([]);
    const lower = analyseTemperatureLog(log, { overTemperatureC: 100 });
    expect(lower.overTemperature.episodes).toHaveLength(3);
    expect(lower.overTemperature.thresholdC).toBe(100);
  });

  it('keeps one episode when the coolant hovers at the threshold', () => {
    const hover = syntheticLog({
      ...BASE,
      seed: 5,
      noiseK: 0.8,
      durationSeconds: 3000,
      episodes: [{ startSeconds: 1500, durationSeconds: 900, peakC: 110.5, rampKPerMin: 6 }],
    });
    const found = analyseTemperatureLog(hover).overTemperature.episodes;
    expect(found).toHaveLength(1);
    expect(Math.abs((found[0]?.durationSeconds ?? 0) - 900)).toBeLessThanOrEqual(60);
  });

  it('marks an episode the log ends in', () => {
    const cut = syntheticLog({
      ...BASE,
      durationSeconds: 1600,
      episodes: [{ startSeconds: 1500, durationSeconds: 400, peakC: 114 }],
    });
    const [episode] = analyseTemperatureLog(cut).overTemperature.episodes;
    expect(episode?.ongoingAtEnd).toBe(true);
    expect(episode?.endSeconds).toBe(1600);
  });
});

describe('swings (known amplitude and period)', () => {
  it('finds a hunting thermostat’s swing without a fan channel, and cannot tell the cause', () => {
    const log = syntheticLog({
      ...BASE,
      durationSeconds: 3000,
      regulation: { amplitudeK: 4, periodSeconds: 90, shape: 'sine' },
    });
    const a = analyseTemperatureLog(log);
    expect(a.swings.episodes).toHaveLength(1);
    const [swing] = a.swings.episodes;
    // Peak to trough 8 K, less what a 10 s average takes off a 90 s sine (2 %), plus noise.
    expect(Math.abs((swing?.amplitudeK ?? 0) - 8)).toBeLessThanOrEqual(0.8);
    expect(Math.abs((swing?.periodSeconds ?? 0) - 90)).toBeLessThanOrEqual(5);
    expect(swing?.cycles).toBeGreaterThanOrEqual(20);
    expect(swing?.fanFollows).toBeNull();
    expect(swing?.suggestion).toBe('fan-or-thermostat');
  });

  it('points at the thermostat when the fan channel stays off through the swings', () => {
    const log = syntheticLog({
      ...BASE,
      durationSeconds: 3000,
      regulation: { amplitudeK: 3, periodSeconds: 150, shape: 'sine' },
      fan: 'off',
    });
    const [swing] = analyseTemperatureLog(log).swings.episodes;
    expect(swing?.fanFollows).toBe(false);
    expect(swing?.suggestion).toBe('thermostat-hunting');
    expect(Math.abs((swing?.periodSeconds ?? 0) - 150)).toBeLessThanOrEqual(8);
  });

  it('reads a fan cycling when the fan runs on the falls', () => {
    const log = syntheticLog({
      ...BASE,
      durationSeconds: 3000,
      openingC: 92,
      regulation: { offsetK: 4, amplitudeK: 3, periodSeconds: 120, shape: 'fan-sawtooth' },
    });
    const [swing] = analyseTemperatureLog(log).swings.episodes;
    expect(swing?.fanFollows).toBe(true);
    expect(swing?.suggestion).toBe('fan-cycling');
    expect(Math.abs((swing?.amplitudeK ?? 0) - 6)).toBeLessThanOrEqual(0.8);
    expect(Math.abs((swing?.periodSeconds ?? 0) - 120)).toBeLessThanOrEqual(6);
    expect(Math.abs((swing?.meanC ?? 0) - 96)).toBeLessThanOrEqual(0.5);
  });

  it('finds no swing in a steady log, nor in swings smaller than the minimum', () => {
    expect(analyseTemperatureLog(syntheticLog(BASE)).swings.episodes).toEqual([]);
    const small = syntheticLog({
      ...BASE,
      durationSeconds: 3000,
      regulation: { amplitudeK: 1, periodSeconds: 90 },
    });
    expect(analyseTemperatureLog(small).swings.episodes).toEqual([]);
    expect(analyseTemperatureLog(small, { minSwingK: 1.5 }).swings.episodes).toHaveLength(1);
  });

  it('does not take one over-temperature episode for a swing', () => {
    const log = syntheticLog({
      ...BASE,
      durationSeconds: 3000,
      episodes: [{ startSeconds: 1600, durationSeconds: 300, peakC: 118 }],
    });
    expect(analyseTemperatureLog(log).swings.episodes).toEqual([]);
  });
});
