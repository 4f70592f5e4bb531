// A small log worked through by hand, so the analysis is checked against arithmetic a person can
// follow rather than against itself. Readings every 60 s (invented):
//
//   t s   0   60  120 180 240 300 360 420 480 540 600 660 720 780 840 900 960 1020 1080 1140 1200 … 1500
//   T °C  30  36  42  48  54  60  66  72  78  84  90  90  90  90  90  90  104 116  118  100  90   … 90
//
// Options chosen so no smoothing applies (windows shorter than one step: smoothing 30 s and
// swing smoothing 10 s round to no neighbours at a 60 s step; episodes on the readings as
// they are) and the slope window is two readings (120 s).
//
// Opening. Rate before t is (T(t) − T(t − 120)) / 120 s, rate after is (T(t + 120) − T(t)) / 120 s.
//   t = 540: before (84 − 72)/120 = 0.1 K/s, after (90 − 84)/120 = 0.05 K/s; 0.05 > 0.3 × 0.1: not flat yet.
//   t = 600: before (90 − 78)/120 = 0.1 K/s, after (90 − 90)/120 = 0; rise from 30 °C is 60 K ≥ 15 K: flat.
//   Sharpest change within two windows (600…840): before − after is 0.1 at 600, 0.05 at 660, 0 later → 600 s.
//   The rise does not resume within 240 s (90 °C throughout). Opening at 600 s, 90.0 °C.
// Warm-up. Coldest before the opening: 30 °C at 0 s, the last reading within 1 K of it; the rise
//   leaves at 6 K/min, so extrapolating back adds nothing: start 0 s, warm-up 600 s = 10.0 min.
// Rise rate. Average (90 − 30) K / 10 min = 6.0 K/min; fastest over 120 s: 12 K / 2 min = 6.0 K/min.
// Time to 80 °C: between 480 s (78) and 540 s (84): 480 + (80 − 78)/(84 − 78) × 60 = 500 s.
// Peak: 118 °C at 1080 s.
// Over 110 °C: up between 960 s (104) and 1020 s (116): 960 + (110 − 104)/(116 − 104) × 60 = 990 s;
//   down between 1080 s (118) and 1140 s (100): 1080 + (118 − 110)/(118 − 100) × 60 = 1106.67 s;
//   100 °C is below 110 − 2 = 108 °C, so the episode ends there. Duration 116.67 s ≥ 60 s.
// Settled: from 600 + 60 = 660 s to 1500 s, leaving out 990…1106.67 s (the readings at 1020 and
//   1080 s): twelve readings of 90, one of 104 and one of 100 → median 90 °C.
// Swings: one rise and fall only, no three cycles → none.
import { describe, expect, it } from 'vitest';
import { parsed } from '../test/parse-helpers.js';
import { analyseTemperatureLog } from './analyse-temperature-log.js';

const TABLE: readonly (readonly [number, number])[] = [
  [0, 30],
  [60, 36],
  [120, 42],
  [180, 48],
  [240, 54],
  [300, 60],
  [360, 66],
  [420, 72],
  [480, 78],
  [540, 84],
  [600, 90],
  [660, 90],
  [720, 90],
  [780, 90],
  [840, 90],
  [900, 90],
  [960, 104],
  [1020, 116],
  [1080, 118],
  [1140, 100],
  [1200, 90],
  [1260, 90],
  [1320, 90],
  [1380, 90],
  [1440, 90],
  [1500, 90],
];

const OPTIONS = {
  smoothingSeconds: 30,
  slopeWindowSeconds: 120,
  swingSmoothingSeconds: 10,
  episodeSmoothingSeconds: 0,
  minEpisodeSeconds: 60,
  minSettledSeconds: 300,
};

describe('hand-worked log (Heatpath’s method, worked by hand in the comment above)', () => {
  const analysis = analyseTemperatureLog(
    { times: TABLE.map(([t]) => t), coolantC: TABLE.map(([, c]) => c) },
    OPTIONS,
  );

  it('finds the opening at 600 s and 90 °C', () => {
    expect(analysis.opening).toMatchObject({
      found: true,
      atSeconds: 600,
      temperatureC: 90,
      comparedWithTypical: 'within',
    });
  });

  it('times the warm-up at 10 minutes from 30 °C', () => {
    expect(analysis.warmUp).toMatchObject({
      found: true,
      startSeconds: 0,
      openingSeconds: 600,
      seconds: 600,
      fromC: 30,
    });
  });

  it('gives a rise rate of 6 K/min, average and fastest', () => {
    if (!analysis.riseRate.found) {
      throw new Error(analysis.riseRate.reason);
    }
    expect(analysis.riseRate.averageKPerMin).toBeCloseTo(6, 10);
    expect(analysis.riseRate.maxKPerMin).toBeCloseTo(6, 10);
  });

  it('reaches 80 °C at 500 s', () => {
    expect(analysis.timeToTarget).toMatchObject({ found: true, targetC: 80 });
    expect(analysis.timeToTarget.found && analysis.timeToTarget.seconds).toBeCloseTo(500, 10);
  });

  it('peaks at 118 °C at 1080 s', () => {
    expect(analysis.peak).toMatchObject({ valueC: 118, atSeconds: 1080 });
  });

  it('finds one episode over 110 °C from 990 s for 116.67 s, peak 118 °C', () => {
    const [episode, ...more] = analysis.overTemperature.episodes;
    expect(more).toEqual([]);
    expect(episode?.startSeconds).toBeCloseTo(990, 10);
    expect(episode?.endSeconds).toBeCloseTo(1106.667, 3);
    expect(episode?.durationSeconds).toBeCloseTo(116.667, 3);
    expect(episode).toMatchObject({ peakC: 118, peakAtSeconds: 1080, ongoingAtEnd: false });
  });

  it('settles at 90 °C and finds no swings', () => {
    expect(analysis.settled).toMatchObject({
      found: true,
      medianC: 90,
      fromSeconds: 660,
      toSeconds: 1500,
    });
    expect(analysis.swings.episodes).toEqual([]);
  });

  it('gives the same answers when the table arrives as a semicolon file in °F with mm:ss times', async () => {
    // °F written to two places: (T × 9/5) + 32, so 30 °C is 86,00 and 118 °C is 244,40.
    const lines = TABLE.map(([t, c]) => {
      const mmss = `${String(Math.floor(t / 60)).padStart(2, '0')}:${String(t % 60).padStart(2, '0')}`;
      return `${mmss};${(c * 1.8 + 32).toFixed(2).replace('.', ',')}`;
    });
    const series = await parsed(`Elapsed;Coolant °F\n${lines.join('\n')}\n`);
    const again = analyseTemperatureLog(series, OPTIONS);
    expect(again.opening.found && again.opening.temperatureC).toBeCloseTo(90, 10);
    expect(again.overTemperature.episodes[0]?.startSeconds).toBeCloseTo(990, 6);
    expect(again.peak.valueC).toBeCloseTo(118, 10);
  });

  it('says how each result was found and how far to trust it', () => {
    for (const part of [
      analysis.peak,
      analysis.warmUp,
      analysis.opening,
      analysis.riseRate,
      analysis.timeToTarget,
      analysis.settled,
      analysis.overTemperature,
      analysis.swings,
    ]) {
      expect(part.basis.method.length).toBeGreaterThan(20);
      expect(part.basis.status).toMatch(/Heatpath’s method|Read (straight )?from the log/);
    }
    expect(analysis.overTemperature.basis.status).toMatch(/common practice/);
    expect(analysis.opening.basis.status).toMatch(
      /82–91 °C \(published trade textbook site; medium confidence\)/,
    );
  });
});
