// Candidate readings for the walk: named, in the tree format's units, pointing at the shipped
// trees' inputs they answer, always waiting for the technician's confirmation.
import { describe, expect, it } from 'vitest';
import { analyseTemperatureLog } from '../analysis/analyse-temperature-log.js';
import { syntheticLog } from '../testing/synthetic-log.js';
import { candidateReadings } from './candidate-readings.js';

describe('candidateReadings', () => {
  const log = syntheticLog({
    seed: 3,
    durationSeconds: 3600,
    startC: 20,
    closedAsymptoteC: 125,
    timeConstantSeconds: 600,
    openingC: 88,
    noiseK: 0.2,
    ambientC: 14,
    episodes: [{ startSeconds: 2000, durationSeconds: 300, peakC: 115 }],
  });
  const analysis = analyseTemperatureLog(log);
  const readings = candidateReadings(analysis);
  const byName = new Map(readings.map((r) => [r.name, r]));

  it('offers the opening temperature and warm-up time, rounded to a tenth', () => {
    const opening = byName.get('thermostatOpeningC');
    expect(opening).toMatchObject({
      unit: 'degC',
      quantity: 'temperature',
      needsConfirmation: true,
    });
    expect(Math.abs((opening?.value ?? 0) - 88)).toBeLessThanOrEqual(1);
    expect(Number.isInteger((opening?.value ?? 0) * 10)).toBe(true);
    expect(byName.get('warmUpMinutes')).toMatchObject({ unit: 'min', quantity: 'time' });
    expect(
      Math.abs((byName.get('warmUpMinutes')?.value ?? 0) - log.truth.warmUpSeconds / 60),
    ).toBeLessThanOrEqual(0.3);
  });

  it('points each reading at the shipped trees’ inputs it answers', () => {
    expect(byName.get('minutesToTargetC')?.matchesInputs).toEqual(['minutesTo80']);
    expect(byName.get('peakCoolantC')?.matchesInputs).toEqual(['liveDataTemp']);
    expect(byName.get('settledCoolantC')?.matchesInputs).toEqual(['settledTemp']);
    expect(byName.get('ambientC')).toMatchObject({ value: 14, matchesInputs: ['ambientTemp'] });
  });

  it('counts the over-temperature episodes and gives the longest', () => {
    expect(byName.get('overTemperatureEpisodes')).toMatchObject({
      value: 1,
      unit: 'none',
      quantity: 'number',
    });
    expect(
      Math.abs((byName.get('longestOverTemperatureMinutes')?.value ?? 0) - 5),
    ).toBeLessThanOrEqual(0.3);
  });

  it('carries how each was found, and every one waits for confirmation', () => {
    for (const r of readings) {
      expect(r.needsConfirmation).toBe(true);
      expect(r.basis.method).not.toBe('');
      expect(r.label).not.toBe('');
      expect(['degC', 'min', 'K', 'none']).toContain(r.unit);
    }
  });

  it('leaves out what the log does not show, and offers 60 min when an hour never reached 80 °C', () => {
    const cold = syntheticLog({
      seed: 4,
      durationSeconds: 3700,
      startC: 5,
      closedAsymptoteC: 100,
      timeConstantSeconds: 1200,
      openingC: 78,
      noiseK: 0.2,
    });
    const names = candidateReadings(analyseTemperatureLog(cold)).map((r) => r.name);
    expect(names).not.toContain('ambientC');
    expect(names).not.toContain('longestOverTemperatureMinutes');
    expect(names).not.toContain('swingAmplitudeK');
    const target = candidateReadings(analyseTemperatureLog(cold)).find(
      (r) => r.name === 'minutesToTargetC',
    );
    expect(target).toMatchObject({ value: 60, matchesInputs: ['minutesTo80'] });
    const short = syntheticLog({
      seed: 4,
      durationSeconds: 1200,
      startC: 5,
      closedAsymptoteC: 100,
      timeConstantSeconds: 1200,
      openingC: 78,
    });
    expect(candidateReadings(analyseTemperatureLog(short)).map((r) => r.name)).not.toContain(
      'minutesToTargetC',
    );
  });

  it('offers the swing amplitude when the coolant swings', () => {
    const hunting = syntheticLog({
      seed: 6,
      durationSeconds: 2400,
      startC: 20,
      closedAsymptoteC: 125,
      timeConstantSeconds: 600,
      openingC: 88,
      regulation: { amplitudeK: 3, periodSeconds: 100 },
    });
    const swing = candidateReadings(analyseTemperatureLog(hunting)).find(
      (r) => r.name === 'swingAmplitudeK',
    );
    expect(swing).toMatchObject({ unit: 'K', quantity: 'temperatureDelta' });
    expect(Math.abs((swing?.value ?? 0) - 6)).toBeLessThanOrEqual(0.6);
  });
});
