// Every bad file issue 9 lists gets a clear message naming the line at fault, and nothing is
// handed out half-read: the parse rejects as a whole.
import { describe, expect, it } from 'vitest';
import { file, refused, rows } from '../test/parse-helpers.js';

const HEADER = 'Time,Coolant (°C)';

describe('bad files are refused with the line at fault', () => {
  it('empty file', async () => {
    const e = await refused('');
    expect(e.code).toBe('empty');
    expect(e.line).toBe(1);
    expect(e.message).toBe('Line 1: the file is empty.');
  });

  it('a file of blank lines', async () => {
    const e = await refused('\n  \n\t\n');
    expect(e.code).toBe('empty');
    expect(e.message).toBe('Line 3: the file holds only blank lines.');
  });

  it('binary data: a NUL byte on line 4', async () => {
    const e = await refused(`${file(HEADER, '0,80', '1,81')}2,8\u00002\n`);
    expect(e.code).toBe('binary');
    expect(e.line).toBe(4);
    expect(e.message).toMatch(/^Line 4: the file contains binary data \(character code 0\)/);
  });

  it('binary data: a compressed workbook, as bytes', async () => {
    const bytes = new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x06, 0x00]);
    const e = await refused(
      (async function* () {
        yield bytes;
      })(),
    );
    expect(e.code).toBe('binary');
    expect(e.line).toBe(1);
    expect(e.message).toMatch(/compressed workbook or archive/);
  });

  it('binary data far into the file', async () => {
    const e = await refused(file(HEADER, ...rows(5000), '5000,\u0007'), { pieceChars: 1024 });
    expect(e.code).toBe('binary');
    expect(e.line).toBe(5002);
  });

  it('one column', async () => {
    const e = await refused(file('Coolant', '80.1', '80.5', '81.0', '81.2'));
    expect(e.code).toBe('single-column');
    expect(e.message).toMatch(/^Line 1: the file has one column\./);
  });

  it('one column, after a blank first line', async () => {
    const e = await refused(file('', '80.1', '80.5'));
    expect(e.line).toBe(2);
  });

  it('non-numeric temperature', async () => {
    const e = await refused(file(HEADER, ...rows(6), '6,n/a', ...rows(6, ',', 7)));
    expect(e.code).toBe('not-a-number');
    expect(e.line).toBe(8);
    expect(e.column).toBe(1);
    expect(e.message).toBe(
      'Line 8: column 2 ("Coolant (°C)"): the coolant temperature "n/a" is not a number.',
    );
  });

  it('a decimal mark that differs from the rest of the file', async () => {
    const later = Array.from({ length: 8 }, (_, i) => `${i + 3};81,${i}`);
    const e = await refused(file('Time;Coolant (°C)', '0;80,5', '1;80,7', '2;80.9', ...later));
    expect(e.code).toBe('not-a-number');
    expect(e.line).toBe(4);
    expect(e.message).toMatch(
      /"80.9" uses a decimal point, but the rest of the file uses a decimal comma/,
    );
  });

  it('non-numeric value in an optional channel', async () => {
    const e = await refused(
      file(
        'Time,Coolant (°C),Fan duty %',
        ...rows(10).map((r, i) => `${r},${i === 7 ? 'on' : '0'}`),
      ),
    );
    expect(e.code).toBe('not-a-number');
    expect(e.line).toBe(9);
    expect(e.message).toMatch(
      /column 3 \("Fan duty %"\): the fan duty or command "on" is not a number/,
    );
  });

  it('time going backwards', async () => {
    const e = await refused(file(HEADER, '0,80', '1,81', '2,82', '1.5,83', ...rows(8, ',', 4)));
    expect(e.code).toBe('time-backwards');
    expect(e.line).toBe(5);
    expect(e.message).toBe(
      'Line 5: the time goes backwards: column 1 ("Time") reads "1.5" after "2" on the reading before.',
    );
  });

  it('clock time going backwards by less than half a day is not midnight', async () => {
    const times = ['10:00:00', '10:00:01', '10:00:02', '09:59:59'];
    const e = await refused(
      file(
        'Clock,Coolant (°C)',
        ...times.map((t) => `${t},85`),
        ...Array.from({ length: 8 }, (_, i) => `10:01:0${i},85`),
      ),
    );
    expect(e.code).toBe('time-backwards');
    expect(e.line).toBe(5);
  });

  it('a time in another format than the first readings', async () => {
    const e = await refused(
      file(
        'Clock,Coolant (°C)',
        '10:00:00,85',
        '10:00:01,85',
        '10:00:02 PM,85',
        ...Array.from({ length: 8 }, (_, i) => `10:00:1${i},85`),
      ),
    );
    expect(e.code).toBe('bad-time');
    expect(e.line).toBe(4);
    expect(e.message).toMatch(
      /"10:00:02 PM" is not a time in hours, minutes and seconds \(hh:mm:ss\)/,
    );
  });

  it('a missing time', async () => {
    const e = await refused(file(HEADER, ...rows(5), ',85', ...rows(5, ',', 6)));
    expect(e.code).toBe('missing-value');
    expect(e.line).toBe(7);
  });

  it.each([
    ['151', 'above 150 °C', /the coolant temperature 151 °C is outside -50 to 150 °C/],
    ['-51', 'below −50 °C', /the coolant temperature -51 °C is outside -50 to 150 °C/],
  ])('absurd coolant value %s (%s)', async (value, _why, message) => {
    const e = await refused(file(HEADER, ...rows(9), `9,${value}`, ...rows(3, ',', 10)));
    expect(e.code).toBe('out-of-range');
    expect(e.line).toBe(11);
    expect(e.message).toMatch(message);
  });

  it('absurd coolant value in °F names both units', async () => {
    const e = await refused(
      file(
        'Time,Coolant (°F)',
        ...rows(4).map((r) => `${r.split(',')[0]},190`),
        '4,350',
        ...rows(6, ',', 5),
      ),
    );
    expect(e.line).toBe(6);
    expect(e.message).toMatch(
      /the coolant temperature 350 °F \(176.7 °C\) is outside -50 to 150 °C/,
    );
  });

  it('a °F log read as °C trips the upper limit', async () => {
    const e = await refused(
      file('Time,Coolant', ...Array.from({ length: 12 }, (_, i) => `${i},${150 + i * 5}`)),
      {
        mapping: { time: 0, coolant: 1, temperatureUnit: 'degC' },
      },
    );
    expect(e.code).toBe('out-of-range');
    expect(e.line).toBe(3);
    expect(e.message).toMatch(/Check the column mapping and the unit/);
  });

  it('absurd ambient and engine-speed values', async () => {
    const ambient = await refused(
      file(
        'Time,Coolant (°C),Ambient (°C)',
        ...rows(10).map((r, i) => `${r},${i === 2 ? 75 : 20}`),
      ),
    );
    expect(ambient.line).toBe(4);
    expect(ambient.message).toMatch(/ambient temperature 75 °C is outside -50 to 60 °C/);
    const rpm = await refused(
      file(
        'Time,Coolant (°C),Engine rpm',
        ...rows(10).map((r, i) => `${r},${i === 9 ? 25000 : 900}`),
      ),
    );
    expect(rpm.line).toBe(11);
    expect(rpm.message).toMatch(/engine speed 25000 rpm is outside 0 to 15000 rpm/);
  });

  it('too few rows', async () => {
    const e = await refused(file(HEADER, ...rows(4)));
    expect(e.code).toBe('too-few-rows');
    expect(e.line).toBe(5);
    expect(e.message).toBe(
      'Line 5: the log ends here after 4 readings; Heatpath needs at least 10 to analyse a log.',
    );
  });

  it('a header and no readings', async () => {
    const e = await refused(file(HEADER, 'Start,End'));
    expect(e.code).toBe('no-readings');
    expect(e.line).toBe(1);
  });

  it('too many rows', async () => {
    const e = await refused(file(HEADER, ...rows(30)), { maxRows: 25 });
    expect(e.code).toBe('too-many-rows');
    expect(e.line).toBe(27);
  });

  it('every reading at the same time', async () => {
    const e = await refused(file(HEADER, ...Array.from({ length: 12 }, () => '5,85')));
    expect(e.code).toBe('no-time-span');
    expect(e.line).toBe(13);
  });

  it('a line missing the mapped columns', async () => {
    const e = await refused(
      file(
        'Time,Coolant (°C),Ambient (°C)',
        ...rows(5).map((r) => `${r},20`),
        '5',
        ...rows(5, ',', 6).map((r) => `${r},20`),
      ),
    );
    expect(e.code).toBe('short-row');
    expect(e.line).toBe(7);
    expect(e.message).toBe('Line 7: this line has 1 column, but the mapping reads up to column 3.');
  });

  it('a quoted value left open', async () => {
    const e = await refused(file(HEADER, ...rows(5), '5,"85', ...rows(5, ',', 6)));
    expect(e.code).toBe('bad-quotes');
    expect(e.line).toBe(7);
  });

  it('a quoted value running over a line break', async () => {
    const e = await refused(file(HEADER, ...rows(5), '5,"85', '",5', ...rows(5, ',', 7)));
    expect(e.code).toBe('bad-quotes');
    expect(e.line).toBe(7);
    expect(e.message).toMatch(/runs over more than one line/);
  });

  it('columns that no delimiter separates consistently', async () => {
    const e = await refused(file('1,2', '1,2,3', '1,2,3,4', '1,2,3,4,5'));
    expect(e.code).toBe('inconsistent-columns');
    expect(e.line).toBe(1);
    expect(e.message).toMatch(/^Line 1: this line has 2 columns where other lines have 5/);
  });

  it('a line far too long to be a reading', async () => {
    const e = await refused(`${HEADER}\n0,${'9'.repeat((1 << 20) + 10)}`, { pieceChars: 4096 });
    expect(e.code).toBe('line-too-long');
    expect(e.line).toBe(2);
  });

  it('refuses options that make no sense', async () => {
    const e = await refused(file(HEADER, ...rows(10)), { minRows: 0 });
    expect(e.code).toBe('invalid-options');
  });

  it('hands out nothing when the fault is near the end of a long file', async () => {
    const lines = Array.from({ length: 20_000 }, (_, i) => `${i},${i === 19_998 ? 999 : 90}`);
    const e = await refused(file(HEADER, ...lines), { pieceChars: 2048 });
    expect(e.code).toBe('out-of-range');
    expect(e.line).toBe(20_000);
  });
});
