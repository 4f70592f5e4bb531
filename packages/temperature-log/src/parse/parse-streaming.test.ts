// Input forms and encodings, chunk boundaries anywhere, and a long log read in pieces with the
// event loop getting its turns. Also a round trip over every layout the writer can produce.
import { Readable } from 'node:stream';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseTemperatureLog } from './parse-temperature-log.js';
import { logCsv } from '../testing/log-csv.js';
import type { CsvLayout } from '../testing/log-csv.js';
import { syntheticLog } from '../testing/synthetic-log.js';
import { file, needsMapping, parsed, rows } from '../test/parse-helpers.js';

const TEXT = file(
  'Time;Coolant (°F);Ambient (°F)',
  ...Array.from({ length: 12 }, (_, i) => `${i};${190 + i},5;68`),
);

async function* chunksOf(bytes: Uint8Array, size: number): AsyncGenerator<Uint8Array> {
  for (let i = 0; i < bytes.length; i += size) {
    yield bytes.subarray(i, i + size);
  }
}

function bytes(text: string): Uint8Array {
  return new TextEncoder().encode(text);
}

describe('input forms', () => {
  it('reads bytes however they are cut, even inside the two bytes of "°"', async () => {
    const expected = await parsed(TEXT);
    const all = bytes(TEXT);
    for (const size of [1, 2, 3, 7, 64, all.length]) {
      const s = await parsed(chunksOf(all, size));
      expect(s.coolantC).toEqual(expected.coolantC);
      expect(s.detected.encoding).toBe('utf-8');
      expect(s.detected.unit).toBe('degF');
    }
  });

  it('reads a WHATWG ReadableStream and a Node stream', async () => {
    const web = new ReadableStream<Uint8Array>({
      start(controller) {
        controller.enqueue(bytes(TEXT.slice(0, 40)));
        controller.enqueue(bytes(TEXT.slice(40)));
        controller.close();
      },
    });
    expect((await parsed(web)).rows).toBe(12);
    expect((await parsed(Readable.from([Buffer.from(TEXT)]))).rows).toBe(12);
    expect((await parsed(Readable.from([TEXT.slice(0, 10), TEXT.slice(10)]))).rows).toBe(12);
  });

  it('cancels a stream it stops reading because a mapping is needed', async () => {
    let pulls = 0;
    let cancelled = false;
    const line = bytes(`${rows(1)[0] ?? ''}\n`);
    const endless = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulls += 1;
        controller.enqueue(line);
      },
      cancel() {
        cancelled = true;
      },
    });
    const r = await parseTemperatureLog(endless);
    expect(r.status).toBe('needs-mapping');
    expect(cancelled).toBe(true);
    expect(pulls).toBeLessThan(70_000);
  });
});

describe('encodings', () => {
  it('reads a Windows code-page export, whose "°" is byte 0xB0', async () => {
    const latin = Uint8Array.from(
      [...file('Time,Coolant (°F)', ...rows(12))].map((c) => c.charCodeAt(0)),
    );
    expect(latin.includes(0xb0)).toBe(true);
    const s = await parsed(chunksOf(latin, 5));
    expect(s.detected.encoding).toBe('windows-1252');
    expect(s.detected.unit).toBe('degF');
  });

  it('reads UTF-16 with a byte-order mark, little- and big-endian', async () => {
    const text = file('Time,Coolant (°C)', ...rows(12));
    const le = new Uint8Array(2 + text.length * 2);
    const be = new Uint8Array(2 + text.length * 2);
    le.set([0xff, 0xfe]);
    be.set([0xfe, 0xff]);
    for (let i = 0; i < text.length; i += 1) {
      const code = text.charCodeAt(i);
      le.set([code & 0xff, code >> 8], 2 + i * 2);
      be.set([code >> 8, code & 0xff], 2 + i * 2);
    }
    const fromLe = await parsed(chunksOf(le, 3));
    const fromBe = await parsed(chunksOf(be, 5));
    expect(fromLe.detected.encoding).toBe('utf-16le');
    expect(fromBe.detected.encoding).toBe('utf-16be');
    expect(fromLe.coolantC).toEqual(fromBe.coolantC);
    expect(fromLe.coolantC[11]).toBe(25.5);
  });

  it('takes UTF-16 without a byte-order mark for binary, and says so', async () => {
    const text = file('Time,Coolant (°C)', ...rows(12));
    const le = new Uint8Array(text.length * 2);
    for (let i = 0; i < text.length; i += 1) {
      le[i * 2] = text.charCodeAt(i) & 0xff;
    }
    await expect(parseTemperatureLog(chunksOf(le, 100))).rejects.toThrow(
      /UTF-16 text without a byte-order mark/,
    );
  });
});

describe('a long log', () => {
  const long = logCsv(
    syntheticLog({
      seed: 7,
      durationSeconds: 99_999,
      startC: 20,
      closedAsymptoteC: 125,
      timeConstantSeconds: 600,
      openingC: 88,
      noiseK: 0.3,
    }),
  );

  it('reads 100,000 rows in pieces, giving the event loop a turn after each', async () => {
    let turns = 0;
    let longestGapMs = 0;
    let last = performance.now();
    const s = await parsed(long, {
      yieldToEventLoop: async () => {
        const now = performance.now();
        longestGapMs = Math.max(longestGapMs, now - last);
        turns += 1;
        await new Promise<void>((resolve) => setImmediate(resolve));
        last = performance.now();
      },
    });
    expect(s.rows).toBe(100_000);
    // 100,000 lines of about 12 characters in pieces of 64 KiB: at least 15 turns.
    expect(turns).toBeGreaterThanOrEqual(15);
    // A loose bound, far above the few milliseconds one piece takes, to catch a parse that holds
    // the loop for the whole file (about half a second here); not a benchmark.
    expect(longestGapMs).toBeLessThan(250);
  });

  it('lets other work run while it reads', async () => {
    let ticks = 0;
    let running = true;
    const tick = (): void => {
      ticks += 1;
      if (running) {
        setImmediate(tick);
      }
    };
    setImmediate(tick);
    await parsed(long);
    running = false;
    expect(ticks).toBeGreaterThanOrEqual(15);
  });
});

describe('round trip over every layout', () => {
  it('reads back what the writer wrote, in any delimiter, decimal mark, time format and unit', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.record({
          delimiter: fc.constantFrom<NonNullable<CsvLayout['delimiter']>>(',', ';', '\t'),
          decimal: fc.constantFrom<NonNullable<CsvLayout['decimal']>>('.', ','),
          header: fc.boolean(),
          timeFormat: fc.constantFrom<NonNullable<CsvLayout['timeFormat']>>(
            'seconds',
            'milliseconds',
            'mm:ss',
            'hh:mm:ss',
            'iso',
          ),
          unit: fc.constantFrom<NonNullable<CsvLayout['unit']>>('degC', 'degF'),
          newline: fc.constantFrom<NonNullable<CsvLayout['newline']>>('\n', '\r\n'),
        }),
        fc.integer({ min: 1, max: 1_000_000 }),
        async (layout, seed) => {
          const log = syntheticLog({
            seed,
            durationSeconds: 200,
            startC: 15,
            closedAsymptoteC: 120,
            timeConstantSeconds: 300,
            openingC: 85,
            noiseK: 0.5,
            ambientC: 12,
          });
          const text = logCsv(log, layout);
          const result = await parseTemperatureLog(text);
          const mapping = {
            time: 0,
            coolant: 1,
            ambient: 2,
            temperatureUnit: layout.unit,
            timeUnit: layout.timeFormat === 'milliseconds' ? ('milliseconds' as const) : undefined,
          };
          const s = result.status === 'parsed' ? result.series : await parsed(text, { mapping });
          expect(result.status).toBe(layout.header ? 'parsed' : 'needs-mapping');
          expect(s.detected.delimiter).toBe(layout.delimiter);
          expect(s.times).toEqual(log.times);
          // Two digits in the file: 0.005 of the file's unit, 0.0028 K for °F.
          s.coolantC.forEach((c, i) => {
            expect(Math.abs(c - (log.coolantC[i] ?? Number.NaN))).toBeLessThan(0.0051);
          });
          expect(s.ambientC?.[0]).toBeCloseTo(12, 2);
        },
      ),
      { numRuns: 60 },
    );
  });
});

it('a mapping request needs no more than the first lines', async () => {
  const r = await needsMapping(file(...rows(12)));
  expect(r.columns.map((c) => c.samples)).toEqual([
    ['0', '1', '2', '3', '4'],
    ['20.0', '20.5', '21.0', '21.5', '22.0'],
  ]);
});
