// The parser over every layout issue 9 lists: delimiters, decimal marks, header or none, the
// four time formats, and °C/°F from the header. Every log here is invented.
import { describe, expect, it } from 'vitest';
import { file, needsMapping, parsed, rows } from '../test/parse-helpers.js';

const TEN = Array.from({ length: 10 }, (_, i) => i);

describe('delimiters and decimal marks', () => {
  it('reads a comma-separated file with decimal points', async () => {
    const s = await parsed(file('Time (s),Coolant (°C)', ...rows(10, ',')));
    expect(s.detected.delimiter).toBe(',');
    expect(s.detected.decimal).toBe('.');
    expect(s.times).toEqual(TEN);
    expect(s.coolantC).toEqual(TEN.map((i) => 20 + i * 0.5));
  });

  it('reads a semicolon file with decimal commas ("87,5")', async () => {
    const lines = TEN.map((i) => `${i};${80 + i},5;21,${i}`);
    const s = await parsed(file('Sample (s);Coolant °C;Ambient °C', ...lines), {
      mapping: { time: 0, coolant: 1, ambient: 2 },
    });
    expect(s.detected.delimiter).toBe(';');
    expect(s.detected.decimal).toBe(',');
    expect(s.coolantC[0]).toBe(80.5);
    expect(s.coolantC[9]).toBe(89.5);
    expect(s.ambientC?.[3]).toBe(21.3);
  });

  it('takes semicolon over comma when a semicolon file with decimal commas splits evenly on both', async () => {
    // No header: "0;87,5;21,5" is three fields on ";" and also three on ",".
    const lines = TEN.map((i) => `${i};87,${i};21,5`);
    const r = await needsMapping(file(...lines));
    expect(r.detected.delimiter).toBe(';');
    expect(r.detected.decimal).toBe(',');
    expect(r.columns).toHaveLength(3);
  });

  it('reads a tab-separated file', async () => {
    const s = await parsed(
      file('time\tECT °C\tIAT °C', ...TEN.map((i) => `${i}\t${70 + i}\t${30 + i}`)),
    );
    expect(s.detected.delimiter).toBe('\t');
    expect(s.coolantC).toEqual(TEN.map((i) => 70 + i));
    expect(s.intakeAirC).toEqual(TEN.map((i) => 30 + i));
    expect(s.mapping.intakeAir).toBe(2);
  });

  it('reads quoted decimal commas in a comma-separated file', async () => {
    const s = await parsed(file('Time,Coolant (°C)', ...TEN.map((i) => `${i},"${80 + i},25"`)));
    expect(s.detected.decimal).toBe(',');
    expect(s.coolantC[2]).toBe(82.25);
  });

  it('reads a file whose first readings are whole numbers and later ones have decimals', async () => {
    // The decimal mark is decided from the first 60 lines; these are all whole numbers.
    const seventy = Array.from({ length: 70 }, (_, i) => `${i};${20 + i}`);
    const lines = [...seventy, '70;90,5'];
    const s = await parsed(file('time;coolant °C', ...lines));
    expect(s.detected.decimal).toBeNull();
    expect(s.coolantC[70]).toBe(90.5);
  });

  it('reads CRLF and lone-CR line breaks, a byte-order mark and a trailing delimiter', async () => {
    const crlf = `\uFEFFTime;Coolant (°C);\r\n${rows(10, ';')
      .map((r) => `${r};`)
      .join('\r\n')}\r\n`;
    const s = await parsed(crlf);
    expect(s.rows).toBe(10);
    expect(s.detected.columnCount).toBe(3);
    const cr = `Time,Coolant (°C)\r${rows(10).join('\r')}`;
    expect((await parsed(cr)).coolantC[9]).toBe(24.5);
  });
});

describe('header or not', () => {
  it('detects the header and reports its line', async () => {
    const s = await parsed(file('Time,Coolant (°C)', ...rows(10)));
    expect(s.detected.header).toBe(true);
    expect(s.detected.headerLine).toBe(1);
    expect(s.detected.firstDataLine).toBe(2);
  });

  it('asks for a mapping when there is no header, and reads the file once mapped', async () => {
    const text = file(...rows(12));
    const r = await needsMapping(text);
    expect(r.detected.header).toBe(false);
    expect(r.unsure).toEqual(expect.arrayContaining(['time', 'coolant', 'temperatureUnit']));
    expect(r.proposed.time).toBe(0);
    const s = await parsed(text, { mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' } });
    expect(s.rows).toBe(12);
    expect(s.detected.firstDataLine).toBe(1);
  });

  it('skips a preamble above the header, and reads a line of units under it', async () => {
    const text = file(
      'Heatpath test bench export',
      'Vehicle: workshop demo car',
      'Time;Coolant;Intake air;Fan',
      's;°F;°F;%',
      ...TEN.map((i) => `${i};${180 + i};${90 + i};${i * 10}`),
    );
    const s = await parsed(text);
    expect(s.detected.preambleLines).toBe(2);
    expect(s.detected.headerLine).toBe(3);
    expect(s.detected.unitLine).toBe(4);
    expect(s.detected.unit).toBe('degF');
    expect(s.coolantC[0]).toBeCloseTo(82.222, 3);
    expect(s.fanDuty?.[9]).toBe(90);
  });

  it('skips blank lines and keeps the file’s line numbers', async () => {
    const s = await parsed(file('', 'Time,Coolant (°C)', '', ...rows(10), '', ''));
    expect(s.detected.headerLine).toBe(2);
    expect(s.detected.firstDataLine).toBe(4);
    expect(s.rows).toBe(10);
  });
});

describe('time formats', () => {
  const coolant = TEN.map((i) => 85 + i);

  it('reads seconds, with a decimal comma too', async () => {
    const s = await parsed(file('Time;Coolant (°C)', ...TEN.map((i) => `${i},5;${85 + i}`)));
    expect(s.detected.timeFormat).toBe('seconds');
    expect(s.times).toEqual(TEN);
  });

  it('reads milliseconds when the header says ms', async () => {
    const s = await parsed(
      file('Time (ms),Coolant (°C)', ...TEN.map((i) => `${i * 500},${85 + i}`)),
    );
    expect(s.detected.timeFormat).toBe('milliseconds');
    expect(s.times[2]).toBe(1);
  });

  it('reads mm:ss, beyond 59 minutes as well', async () => {
    const times = [
      '58:58',
      '59:28',
      '59:58',
      '60:28',
      '60:58',
      '61:28',
      '61:58',
      '62:28',
      '62:58',
      '63:28',
    ];
    const s = await parsed(
      file('Elapsed,Coolant (°C)', ...times.map((t, i) => `${t},${coolant[i]}`)),
    );
    expect(s.detected.timeFormat).toBe('mm:ss');
    expect(s.times).toEqual(TEN.map((i) => i * 30));
  });

  it('reads hh:mm:ss and runs on past midnight', async () => {
    const times = [
      '23:59:56',
      '23:59:57',
      '23:59:58',
      '23:59:59',
      '00:00:00',
      '00:00:01',
      '00:00:02',
      '00:00:03',
      '00:00:04',
      '00:00:05',
    ];
    const s = await parsed(
      file('Clock,Coolant (°C)', ...times.map((t, i) => `${t},${coolant[i]}`)),
    );
    expect(s.detected.timeFormat).toBe('hh:mm:ss');
    expect(s.times).toEqual(TEN);
    expect(s.startedAt).toBe('23:59:56');
  });

  it('reads ISO timestamps, with and without a zone, and with a space for the T', async () => {
    const zoned = TEN.map(
      (i) => `2024-03-31T01:59:${String(50 + i).padStart(2, '0')}+01:00,${coolant[i]}`,
    );
    const s = await parsed(file('Timestamp,Coolant (°C)', ...zoned));
    expect(s.detected.timeFormat).toBe('iso');
    expect(s.times).toEqual(TEN);
    expect(s.startedAt).toBe('2024-03-31T01:59:50+01:00');

    // A zone change inside the log is honoured: +01:00 to +02:00 is one second later here.
    const shift = file(
      'Timestamp,Coolant (°C)',
      ...TEN.map((i) => `2024-03-31 01:59:${50 + i}.5+01:00,${coolant[i]}`),
      `2024-03-31 03:00:00.5+02:00,95`,
    );
    expect((await parsed(shift)).times[10]).toBe(10);
  });
});

describe('temperature unit from the header', () => {
  const readings = TEN.map((i) => `${i},${194 + i * 0.9}`);

  it.each([
    ['Coolant (°F)'],
    ['ECT_F'],
    ['coolant temp degF'],
    ['Coolant temp deg F'],
    ['Engine coolant ℉'],
  ])('"%s" is °F', async (header) => {
    const s = await parsed(file(`Time,${header}`, ...readings));
    expect(s.detected.unit).toBe('degF');
    expect(s.mapping.temperatureUnit).toBe('degF');
    expect(s.coolantC[0]).toBeCloseTo(90, 6);
  });

  it.each([['Coolant (°C)'], ['ECT_C'], ['coolant temp degC'], ['Coolant [C]'], ['Coolant ºC']])(
    '"%s" is °C',
    async (header) => {
      const s = await parsed(file(`Time,${header}`, ...TEN.map((i) => `${i},${85 + i}`)));
      expect(s.detected.unit).toBe('degC');
      expect(s.coolantC[0]).toBe(85);
    },
  );

  it('asks for the unit when the header does not say, and takes it from the mapping', async () => {
    const text = file('Time,Coolant', ...readings);
    const r = await needsMapping(text);
    expect(r.detected.unit).toBeNull();
    expect(r.unsure).toEqual(['temperatureUnit']);
    expect(r.proposed).toMatchObject({ time: 0, coolant: 1 });
    const s = await parsed(text, { mapping: { time: 0, coolant: 1, temperatureUnit: 'degF' } });
    expect(s.coolantC[0]).toBeCloseTo(90, 6);
  });

  it('converts mph to km/h and keeps engine speed and fan duty as logged', async () => {
    const s = await parsed(
      file(
        'Time,Coolant (°C),Vehicle speed mph,Engine RPM,Fan command %',
        ...TEN.map((i) => `${i},${85 + i},${i * 10},${800 + i * 100},${i * 10}`),
      ),
    );
    expect(s.mapping.vehicleSpeedUnit).toBe('mph');
    expect(s.vehicleSpeedKph?.[1]).toBeCloseTo(16.09344, 5);
    expect(s.engineSpeedRpm?.[2]).toBe(1000);
    expect(s.fanDuty?.[3]).toBe(30);
  });
});

describe('gaps', () => {
  it('keeps an empty optional cell as null and skips a line without a coolant reading', async () => {
    const lines = [
      ...rows(10, ';').map((r, i) => `${r};${i === 4 ? '' : '21'}`),
      '10;;21',
      '11;25.5;21',
    ];
    const s = await parsed(file('Time;Coolant (°C);Ambient (°C)', ...lines));
    expect(s.ambientC?.[4]).toBeNull();
    expect(s.ambientC?.[5]).toBe(21);
    expect(s.rows).toBe(11);
    expect(s.skippedRows).toBe(1);
    expect(s.times[10]).toBe(11);
  });
});
