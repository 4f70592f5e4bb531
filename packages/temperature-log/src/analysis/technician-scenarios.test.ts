// Generated logs of situations a workshop meets, each checked against what a skilled technician
// would accept from the analysis. The trade rules behind each check are common practice, from
// the brief's "Traps a skilled technician avoids" (cooling-diagnosis.md, common practice); the
// tolerances are Heatpath's: ±2 K and ±30 s on an opening the model places exactly.
import { describe, expect, it } from 'vitest';
import { syntheticLog } from '../testing/synthetic-log.js';
import type { SyntheticLog, SyntheticLogSpec } from '../testing/synthetic-log.js';
import { analyseTemperatureLog } from './analyse-temperature-log.js';
import type { AnalyseTemperatureLogOptions } from './analysis-options.js';
import type { TemperatureLogAnalysis } from './analyse-temperature-log.js';

/** A cold start from 20 °C with an 88 °C thermostat (invented engine). */
const COLD_START: SyntheticLogSpec = {
  seed: 4711,
  durationSeconds: 2400,
  startC: 20,
  closedAsymptoteC: 125,
  timeConstantSeconds: 600,
  openingC: 88,
  noiseK: 0.3,
};

function analyse(log: SyntheticLog, options: AnalyseTemperatureLogOptions = {}) {
  return analyseTemperatureLog(log, options);
}

function expectOpeningNear(a: TemperatureLogAnalysis, log: SyntheticLog): void {
  if (!a.opening.found) {
    throw new Error(`No opening: ${a.opening.reason}`);
  }
  expect(Math.abs(a.opening.temperatureC - log.truth.openingC)).toBeLessThanOrEqual(2);
  expect(Math.abs(a.opening.atSeconds - log.truth.openingSeconds)).toBeLessThanOrEqual(30);
}

/** Everything the screen shows about the opening, as one text, for wording checks. */
function openingWords(a: TemperatureLogAnalysis): string {
  return a.opening.found
    ? `${a.opening.comparedWithTypical} ${a.opening.note ?? ''}`
    : a.opening.reason;
}

describe('cold start', () => {
  it('finds the opening at the generated 88 °C and nothing else', () => {
    const log = syntheticLog(COLD_START);
    const a = analyse(log);
    expectOpeningNear(a, log);
    expect(a.opening.found && a.opening.comparedWithTypical).toBe('within');
    expect(a.opening.found && a.opening.shape).toBe('sharp');
    expect(a.shroudRelease.found).toBe(false);
    expect(a.overTemperature.episodes).toEqual([]);
  });
});

describe('warm start', () => {
  // The log of issue 13: a 10-minute log begun with the engine warm, with an over-temperature
  // plateau near 118 °C in it. The opening happened before the logger started; a plateau above
  // the threshold is an episode, never an opening (common practice).
  const log = syntheticLog({
    ...COLD_START,
    durationSeconds: 1800,
    startLoggingAtSeconds: 1200,
    episodes: [{ startSeconds: 1400, durationSeconds: 300, peakC: 118, rampKPerMin: 6 }],
  });
  const a = analyse(log);

  it('reports no opening and says the log starts warm', () => {
    expect(log.truth.openingInLog).toBe(false);
    expect(a.opening.found).toBe(false);
    expect(a.warmUp.found).toBe(false);
    expect(!a.opening.found && a.opening.reason).toMatch(/already warm/);
    expect(!a.opening.found && a.opening.reason).toMatch(/not in this log/);
  });

  it('still finds the over-temperature episode, where it is', () => {
    expect(a.overTemperature.episodes).toHaveLength(1);
    expect(Math.abs((a.overTemperature.episodes[0]?.startSeconds ?? 0) - 200)).toBeLessThanOrEqual(
      10,
    );
  });

  it('reports no opening even when the episode threshold is set above the plateau', () => {
    const high = analyse(log, { overTemperatureC: 125 });
    expect(high.opening.found).toBe(false);
  });
});

describe('switchable coolant pump: the shroud releasing at 70 °C', () => {
  // While the shroud covers the impeller the coolant stands and the sensor warms fast; at the
  // release it dips as cooler coolant arrives, then the whole circuit warms more slowly up to the
  // thermostat's opening (cooling-diagnosis.md, switchable main pump; common practice).
  const spec: SyntheticLogSpec = {
    ...COLD_START,
    seed: 1207,
    timeConstantSeconds: 400,
    shroud: { releaseC: 70, dipK: 4, dipSeconds: 20, timeConstantAfterSeconds: 900 },
  };
  const log = syntheticLog(spec);

  it('takes the later levelling-off for the opening, not the release, when the pump is known', () => {
    const a = analyse(log, { switchablePump: true });
    expectOpeningNear(a, log);
    expect(a.opening.found && a.opening.comparedWithTypical).not.toBe('below');
    expect(a.shroudRelease.found).toBe(true);
    if (a.shroudRelease.found) {
      expect(a.shroudRelease.reading).toBe('shroud-release');
      expect(Math.abs(a.shroudRelease.temperatureC - 70)).toBeLessThanOrEqual(2);
      expect(
        Math.abs(a.shroudRelease.atSeconds - (log.truth.shroudRelease?.seconds ?? 0)),
      ).toBeLessThanOrEqual(30);
      expect(a.shroudRelease.note).toMatch(/shroud releasing/);
      expect(a.shroudRelease.note).toMatch(/not the thermostat opening/);
    }
  });

  it('gives both readings of the stall when it is not known whether the engine has the pump', () => {
    const a = analyse(log);
    expectOpeningNear(a, log);
    expect(a.shroudRelease.found && a.shroudRelease.reading).toBe(
      'shroud-release-or-early-opening',
    );
    const note = a.shroudRelease.found ? a.shroudRelease.note : '';
    expect(note).toMatch(/switchable coolant pump/);
    expect(note).toMatch(/thermostat starting to open early/);
  });

  it('calls the stall a pause on an engine without the pump, still not the opening', () => {
    const a = analyse(log, { switchablePump: false });
    expectOpeningNear(a, log);
    expect(a.shroudRelease.found).toBe(false);
    expect(a.notes.some((n) => /not taken for the opening/.test(n))).toBe(true);
  });

  it.each([600, 1200, 1500])(
    'holds when the circuit warms slower after the release (time constant %d s)',
    (tau) => {
      const slower = syntheticLog({
        ...spec,
        durationSeconds: 3600,
        shroud: { releaseC: 70, timeConstantAfterSeconds: tau },
      });
      const a = analyse(slower, { switchablePump: true });
      expectOpeningNear(a, slower);
      expect(a.shroudRelease.found).toBe(true);
    },
  );

  it('says an opening that stays at 70 °C is not a shroud release', () => {
    // A thermostat that opens at 70 °C: the coolant stays there, it does not climb on.
    const early = syntheticLog({ ...COLD_START, openingC: 70 });
    const a = analyse(early, { switchablePump: true });
    expect(a.opening.found && a.opening.comparedWithTypical).toBe('below');
    expect(a.opening.found && a.opening.note).toMatch(/thermostat opening early/);
  });
});

describe('map-controlled thermostat regulating at 105 °C', () => {
  // Such engines hold 100–110 °C at part load: normal there, not a fault (cooling-diagnosis.md,
  // traps; common practice).
  const log = syntheticLog({
    ...COLD_START,
    seed: 105,
    durationSeconds: 3000,
    openingC: 105,
    closedAsymptoteC: 130,
  });

  it('calls the opening normal for the engine when it is known to have one', () => {
    const a = analyse(log, { mapControlledThermostat: true });
    expectOpeningNear(a, log);
    expect(a.opening.found && a.opening.comparedWithTypical).toBe('within');
    expect(openingWords(a)).toMatch(/normal for a map-controlled thermostat/i);
    expect(a.overTemperature.episodes).toEqual([]);
    expect(a.overTemperature.thresholdC).toBe(115);
  });

  it('says it may be normal when it is not known, with no fault wording', () => {
    const a = analyse(log);
    expectOpeningNear(a, log);
    expect(openingWords(a)).toMatch(/may be normal/);
    expect(openingWords(a)).not.toMatch(/fault|faulty|failed/i);
    expect(a.overTemperature.episodes).toEqual([]);
  });

  it('does not split running at the top of the band (106–111 °C) into many episodes', () => {
    const top = syntheticLog({
      ...COLD_START,
      seed: 11,
      durationSeconds: 3600,
      openingC: 104,
      closedAsymptoteC: 130,
      regulation: { offsetK: 4.5, amplitudeK: 2.5, periodSeconds: 240 },
    });
    // Above 110 °C for about a third of each 4-minute swing: with the old 2 K hysteresis that was
    // one episode per swing.
    expect(analyse(top, { episodeHysteresisK: 2 }).overTemperature.episodes.length).toBeGreaterThan(
      5,
    );
    expect(analyse(top).overTemperature.episodes.length).toBeLessThanOrEqual(1);
    expect(analyse(top, { mapControlledThermostat: true }).overTemperature.episodes).toEqual([]);
  });
});

describe('heat soak after switch-off', () => {
  // With the engine stopped the coolant stops moving and soaks up the block's heat: a brief rise
  // that is not an over-temperature episode while running (cooling-diagnosis.md, traps; common
  // practice).
  const log = syntheticLog({
    ...COLD_START,
    durationSeconds: 2700,
    openingC: 92,
    switchOff: { atSeconds: 1800, soakRiseK: 20, soakPeakAfterSeconds: 240 },
  });

  it('counts no episode and leaves the soak out of the peak', () => {
    // The model's soak peaks at 92 + 20 = 112 °C, above the 110 °C threshold, for minutes.
    expect(Math.max(...log.coolantC)).toBeGreaterThan(110);
    const a = analyse(log);
    expect(a.overTemperature.episodes).toEqual([]);
    expect(a.peak.valueC).toBeLessThan(95);
    expect(a.notes.some((n) => /switched off at 30:00/.test(n) && /heat/.test(n))).toBe(true);
  });

  it('cannot tell without an engine-speed channel, and counts it as the log shows', () => {
    const a = analyseTemperatureLog({ times: log.times, coolantC: log.coolantC });
    expect(a.overTemperature.episodes).toHaveLength(1);
  });

  it('says it cannot tell when a log without engine speed ends hot', () => {
    // Ends 200 s after switch-off, with the soak at 92 + 24.6 K.
    const cut = syntheticLog({
      ...COLD_START,
      durationSeconds: 2000,
      openingC: 92,
      switchOff: { atSeconds: 1800, soakRiseK: 25, soakPeakAfterSeconds: 240 },
    });
    const a = analyseTemperatureLog({ times: cut.times, coolantC: cut.coolantC });
    expect(a.overTemperature.episodes.at(-1)?.ongoingAtEnd).toBe(true);
    expect(a.notes.some((n) => /cannot tell whether the engine was still running/.test(n))).toBe(
      true,
    );
    expect(analyse(cut).overTemperature.episodes).toEqual([]);
  });
});

describe('gradual settle after the opening', () => {
  // A wax thermostat starts to open at its stamped figure and opens further over several kelvin,
  // so the coolant may climb on slowly before it levels (common practice). The opening is the
  // knee where the warm-up's climb first slows, not the later level.
  it.each([
    [4, 150],
    [8, 240],
  ])('reports the knee when the coolant climbs %d K more (time constant %d s)', (riseK, tau) => {
    const log = syntheticLog({
      ...COLD_START,
      durationSeconds: 3000,
      settle: { riseK, timeConstantSeconds: tau },
    });
    const a = analyse(log);
    expectOpeningNear(a, log);
    expect(a.settled.found && Math.abs(a.settled.medianC - log.truth.regulatedC)).toBeLessThan(1);
  });

  it('does not move the opening to a later over-temperature plateau', () => {
    const log = syntheticLog({
      ...COLD_START,
      durationSeconds: 3000,
      settle: { riseK: 5, timeConstantSeconds: 200 },
      episodes: [{ startSeconds: 1800, durationSeconds: 400, peakC: 118, rampKPerMin: 6 }],
    });
    const a = analyse(log);
    expectOpeningNear(a, log);
    expect(a.overTemperature.episodes).toHaveLength(1);
  });
});
