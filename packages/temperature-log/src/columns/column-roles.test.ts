// Header words to channels and units: Heatpath's own narrow rules, table by table.
import { describe, expect, it } from 'vitest';
import { guessRole } from './column-roles.js';
import { headerWords } from './header-words.js';
import { statedPlainTimeUnit, statedSpeedUnit, statedTemperatureUnit } from './stated-units.js';

describe('guessRole', () => {
  it.each([
    ['Time (s)', 'time'],
    ['Date/Time', 'time'],
    ['Elapsed', 'time'],
    ['t', 'time'],
    ['Coolant temperature (°C)', 'coolant'],
    ['ECT_F', 'coolant'],
    ['Engine temp', 'coolant'],
    ['Water temp', 'coolant'],
    ['IAT', 'intakeAir'],
    ['Charge air temperature', 'intakeAir'],
    ['Boost temp', 'intakeAir'],
    ['Ambient air', 'ambient'],
    ['Outside temp', 'ambient'],
    ['Vehicle speed (km/h)', 'vehicleSpeed'],
    ['Speed', 'vehicleSpeed'],
    ['Engine speed', 'engineSpeed'],
    ['RPM', 'engineSpeed'],
    ['Fan speed', 'fanDuty'],
    ['Radiator fan command %', 'fanDuty'],
    ['Temp', 'temperature'],
    ['Coolant level', null],
    ['Coolant pressure (bar)', null],
    ['ECT sensor V', null],
    ['Coolant target temperature', null],
    ['Intake manifold pressure', null],
    ['Throttle', null],
    ['', null],
  ])('"%s" → %s', (header, role) => {
    expect(guessRole(headerWords(header))).toBe(role);
  });
});

describe('stated units', () => {
  it.each([
    ['Coolant (°F)', 'degF'],
    ['Coolant (° F)', 'degF'],
    ['ECT_F', 'degF'],
    ['coolant temp degF', 'degF'],
    ['Coolant Fahrenheit', 'degF'],
    ['Coolant [°C]', 'degC'],
    ['ECT_C', 'degC'],
    ['Coolant ℃', 'degC'],
    ['Coolant', null],
    ['Coolant °C / °F', null],
  ])('"%s" → %s', (header, unit) => {
    expect(statedTemperatureUnit(headerWords(header))).toBe(unit);
  });

  it('reads speed and time units', () => {
    expect(statedSpeedUnit(headerWords('Speed (mph)'))).toBe('mph');
    expect(statedSpeedUnit(headerWords('Speed km/h'))).toBe('km/h');
    expect(statedSpeedUnit(headerWords('Speed'))).toBeNull();
    expect(statedPlainTimeUnit(headerWords('Time [ms]'))).toBe('milliseconds');
    expect(statedPlainTimeUnit(headerWords('Elapsed (min)'))).toBe('minutes');
    expect(statedPlainTimeUnit(headerWords('Time'))).toBe('seconds');
  });
});
