// Options and series the analysis refuses, rather than returning numbers that mean nothing.
import { describe, expect, it } from 'vitest';
import { TemperatureLogError } from '../errors.js';
import { analyseTemperatureLog } from './analyse-temperature-log.js';
import { DEFAULT_ANALYSIS_OPTIONS, MAP_CONTROLLED_OVER_TEMPERATURE_C } from './analysis-options.js';

const SERIES = { times: [0, 1, 2, 3], coolantC: [20, 21, 22, 23] };

describe('analysis options', () => {
  it('uses the documented defaults', () => {
    expect(analyseTemperatureLog(SERIES).options).toEqual(DEFAULT_ANALYSIS_OPTIONS);
    expect(DEFAULT_ANALYSIS_OPTIONS.overTemperatureC).toBe(110);
    expect(DEFAULT_ANALYSIS_OPTIONS.minEpisodeSeconds).toBe(30);
  });

  it('leaves the engine facts unknown unless told, and takes true, false or null', () => {
    expect(DEFAULT_ANALYSIS_OPTIONS.switchablePump).toBeNull();
    expect(DEFAULT_ANALYSIS_OPTIONS.mapControlledThermostat).toBeNull();
    expect(analyseTemperatureLog(SERIES, { switchablePump: true }).options.switchablePump).toBe(
      true,
    );
    expect(
      analyseTemperatureLog(SERIES, { mapControlledThermostat: null }).options
        .mapControlledThermostat,
    ).toBeNull();
  });

  it('raises the default threshold for a map-controlled thermostat, but not a chosen one', () => {
    // Such engines hold 100–110 °C at part load (cooling-diagnosis.md, traps; common practice).
    expect(
      analyseTemperatureLog(SERIES, { mapControlledThermostat: true }).options.overTemperatureC,
    ).toBe(MAP_CONTROLLED_OVER_TEMPERATURE_C);
    expect(
      analyseTemperatureLog(SERIES, { mapControlledThermostat: true, overTemperatureC: 108 })
        .options.overTemperatureC,
    ).toBe(108);
    expect(
      analyseTemperatureLog(SERIES, { mapControlledThermostat: false }).options.overTemperatureC,
    ).toBe(110);
  });

  it.each([
    [{ switchablePump: 'yes' } as unknown as Record<string, number>],
    [{ mapControlledThermostat: 1 } as unknown as Record<string, number>],
    [{ minEpisodeSeconds: -1 }],
    [{ smoothingSeconds: 0 }],
    [{ overTemperatureC: Number.NaN }],
    [{ openingSlopeFraction: 1 }],
    [{ minSwingCycles: Number.POSITIVE_INFINITY }],
    [{ nonsense: 3 } as Record<string, number>],
  ])('refuses %j', (options) => {
    expect(() => analyseTemperatureLog(SERIES, options)).toThrow(TemperatureLogError);
  });

  it.each([
    [{ times: [0], coolantC: [20] }],
    [{ times: [0, 1, 2], coolantC: [20, 21] }],
    [{ times: [0, 2, 1], coolantC: [20, 21, 22] }],
    [{ times: [5, 5], coolantC: [20, 21] }],
    [{ times: [0, 1], coolantC: [20, Number.NaN] }],
  ])('refuses a series it cannot analyse: %j', (series) => {
    expect(() => analyseTemperatureLog(series)).toThrow(TemperatureLogError);
  });

  it('analyses a series whose times do not start at zero', () => {
    const shifted = analyseTemperatureLog(
      { times: [100, 160, 220], coolantC: [80, 81, 82] },
      { warmUpTargetC: 81 },
    );
    expect(shifted.peak.atSeconds).toBe(220);
    expect(shifted.timeToTarget.found && shifted.timeToTarget.seconds).toBe(60);
  });
});
