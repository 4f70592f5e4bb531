// The mapping flow: when the columns are ambiguous the parser stops with the candidates a short
// form needs; a mapping then reads the file; the source signature lets the app remember it.
import { describe, expect, it } from 'vitest';
import { TemperatureLogError } from '../errors.js';
import { parseTemperatureLog } from './parse-temperature-log.js';
import { file, needsMapping, parsed, refused } from '../test/parse-helpers.js';

const TEN = Array.from({ length: 10 }, (_, i) => i);

describe('needs mapping', () => {
  it('lists every column with its header, samples, suggested role and what it looks like', async () => {
    const text = file(
      'Time,Coolant temp engine out (°C),Coolant temp radiator out (°C),Throttle',
      ...TEN.map((i) => `00:00:${String(i).padStart(2, '0')},${90 + i},${80 + i},${i * 3}`),
    );
    const r = await needsMapping(text);
    expect(r.unsure).toEqual(['coolant']);
    expect(r.reasons[0]).toMatch(/Several columns could be the coolant temperature/);
    expect(r.proposed).toMatchObject({ time: 0, coolant: 1, temperatureUnit: 'degC' });
    expect(r.columns).toHaveLength(4);
    expect(r.columns[0]).toMatchObject({
      index: 0,
      header: 'Time',
      samples: ['00:00:00', '00:00:01', '00:00:02', '00:00:03', '00:00:04'],
      suggestedRole: 'time',
      looksLike: 'time',
      timeFormat: 'hh:mm:ss',
    });
    expect(r.columns[2]).toMatchObject({
      suggestedRole: 'coolant',
      looksLike: 'number',
      statedUnit: 'degC',
    });
    expect(r.columns[3]).toMatchObject({
      header: 'Throttle',
      suggestedRole: null,
      samples: ['0', '3', '6', '9', '12'],
    });
    expect(r.detected.timeFormat).toBe('hh:mm:ss');
  });

  it('proposes a column named only "Temp" as the coolant but asks', async () => {
    const r = await needsMapping(file('Time,Temp (°C)', ...TEN.map((i) => `${i},${85 + i}`)));
    expect(r.unsure).toEqual(['coolant']);
    expect(r.proposed.coolant).toBe(1);
    expect(r.reasons[0]).toMatch(/"Temp \(°C\)" may be the coolant temperature/);
  });

  it('asks for the time when no column is named as the time', async () => {
    const r = await needsMapping(file('Sample,Coolant (°C)', ...TEN.map((i) => `${i},${85 + i}`)));
    expect(r.unsure).toEqual(['time']);
    expect(r.proposed.time).toBe(0);
  });

  it('asks for the unit when the headers name both °C and °F', async () => {
    const r = await needsMapping(
      file('Time,Coolant (°F),Intake air (°C)', ...TEN.map((i) => `${i},${190 + i},${30 + i}`)),
    );
    expect(r.unsure).toEqual(['temperatureUnit']);
    expect(r.reasons[0]).toMatch(/both °C and °F/);
  });

  it('finishes with the mapping the form sends back, ignoring unmapped columns', async () => {
    const text = file(
      'Time,Coolant temp engine out (°C),Coolant temp radiator out (°C),Throttle',
      ...TEN.map((i) => `${i},${90 + i},${80 + i},${i * 3}`),
    );
    const s = await parsed(text, { mapping: { time: 0, coolant: 2, intakeAir: null } });
    expect(s.coolantC).toEqual(TEN.map((i) => 80 + i));
    expect(s.intakeAirC).toBeNull();
    expect(s.mapping).toEqual({
      time: 0,
      coolant: 2,
      intakeAir: null,
      temperatureUnit: 'degC',
      vehicleSpeedUnit: 'km/h',
    });
  });

  it('lets the mapping override the header’s unit and the time unit', async () => {
    const text = file('Time,Coolant (°C)', ...TEN.map((i) => `${i},${190 + i}`));
    const s = await parsed(text, {
      mapping: { time: 0, coolant: 1, temperatureUnit: 'degF', timeUnit: 'minutes' },
    });
    expect(s.coolantC[0]).toBeCloseTo(87.778, 3);
    expect(s.times[1]).toBe(60);
  });

  it('asks again for the unit when a mapping leaves it out and the header is silent', async () => {
    const r = await needsMapping(file(...TEN.map((i) => `${i},${85 + i}`)), {
      mapping: { time: 0, coolant: 1 },
    });
    expect(r.unsure).toEqual(['temperatureUnit']);
    expect(r.proposed).toEqual({ time: 0, coolant: 1 });
  });

  it.each([
    [{ time: 0, coolant: 2 }, /column index 2, but the file has 2 columns/],
    [
      { time: 0, coolant: 0 },
      /Column index 0 is mapped as both the time and the coolant temperature/,
    ],
    [{ time: 0, coolant: 1.5 }, /column index 1.5/],
    [{ time: -1, coolant: 1 }, /column index -1/],
  ])('refuses a mapping that does not fit the file: %j', async (mapping, message) => {
    const e = await refused(file('Time,Coolant (°C)', ...TEN.map((i) => `${i},${85 + i}`)), {
      mapping,
    });
    expect(e.code).toBe('invalid-mapping');
    expect(e.line).toBeNull();
    expect(e.message).toMatch(message);
  });

  it('refuses a unit the mapping does not know', async () => {
    const e = await refused(file('Time,Coolant', ...TEN.map((i) => `${i},${85 + i}`)), {
      mapping: { time: 0, coolant: 1, temperatureUnit: 'K' as 'degC' },
    });
    expect(e).toBeInstanceOf(TemperatureLogError);
    expect(e.code).toBe('invalid-mapping');
  });
});

describe('source signature', () => {
  const header = 'Time;Coolant (°C);Ambient (°C)';
  const exportOne = file(header, ...TEN.map((i) => `${i};${80 + i},5;20,0`));
  const exportTwo = file(header, ...TEN.map((i) => `${i * 2};${60 + i},1;3,0`), '20;75,0;3,0');

  it('is the same for two exports of one source, whatever their readings', async () => {
    const one = await parsed(exportOne);
    const two = await parsed(exportTwo);
    expect(one.sourceSignature).toMatch(/^tl1-[0-9a-f]{16}$/);
    expect(two.sourceSignature).toBe(one.sourceSignature);
  });

  it('ignores case and spacing in the header', async () => {
    const loose = file(
      ' time ; COOLANT  (°C) ;Ambient (°C)',
      ...TEN.map((i) => `${i};${80 + i};20`),
    );
    expect((await parsed(loose)).sourceSignature).toBe((await parsed(exportOne)).sourceSignature);
  });

  it('differs when the delimiter or the header differs', async () => {
    const one = (await parsed(exportOne)).sourceSignature;
    const comma = file('Time,Coolant (°C),Ambient (°C)', ...TEN.map((i) => `${i},${80 + i},20`));
    const other = file('Time;Coolant (°C);Intake air (°C)', ...TEN.map((i) => `${i};${80 + i};20`));
    expect((await parsed(comma)).sourceSignature).not.toBe(one);
    expect((await parsed(other)).sourceSignature).not.toBe(one);
  });

  it('is given with a mapping request too, and is the same once the file is mapped', async () => {
    const headerless = file(...TEN.map((i) => `${i};${80 + i},5`));
    const request = await needsMapping(headerless);
    const series = await parsed(headerless, {
      mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' },
    });
    expect(series.sourceSignature).toBe(request.sourceSignature);
    const another = await needsMapping(file(...TEN.map((i) => `${i + 100};${40 + i},0`)));
    expect(another.sourceSignature).toBe(request.sourceSignature);
    const clock = await needsMapping(file(...TEN.map((i) => `10:00:0${i};${80 + i},5`)));
    expect(clock.sourceSignature).not.toBe(request.sourceSignature);
  });

  it('a remembered mapping reads the next export from the same source without asking', async () => {
    const first = await needsMapping(
      file('Log time,T1,T2', ...TEN.map((i) => `${i},${80 + i},${30 + i}`)),
    );
    const remembered = new Map([
      [
        first.sourceSignature,
        { time: 0, coolant: 2, ambient: 1, temperatureUnit: 'degC' as const },
      ],
    ]);
    const next = file('Log time,T1,T2', ...TEN.map((i) => `${i},${10 + i},${70 + i}`));
    const again = await parseTemperatureLog(next);
    expect(again.status).toBe('needs-mapping');
    const mapping = remembered.get(again.status === 'needs-mapping' ? again.sourceSignature : '');
    const s = await parsed(next, { mapping });
    expect(s.coolantC[0]).toBe(70);
    expect(s.ambientC?.[0]).toBe(10);
  });
});
