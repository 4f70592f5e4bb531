// Benchmark (not a timed test): writes a 100,000-row log (time, coolant, ambient, fan duty; a
// warm-up, two over-temperature episodes and a cycling fan), then parses and analyses it and
// prints the time taken, the longest stretch the event loop was held, and peak memory. Target
// on the project machine: parse + analyse under 1 s. Run with
// `npx -y pnpm@12.4.2 --filter @heatpath/temperature-log bench`.
import { performance } from 'node:perf_hooks';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { analyseTemperatureLog } from '../src/analysis/analyse-temperature-log.js';
import { parseTemperatureLog } from '../src/parse/parse-temperature-log.js';
import { logCsv } from '../src/testing/log-csv.js';
import { syntheticLog } from '../src/testing/synthetic-log.js';

const ROWS = 100_000;
const RUNS = 5;
const INTERVAL_SECONDS = 0.5;

const log = syntheticLog({
  seed: 20240601,
  durationSeconds: (ROWS - 1) * INTERVAL_SECONDS,
  sampleIntervalSeconds: INTERVAL_SECONDS,
  startC: 18,
  closedAsymptoteC: 125,
  timeConstantSeconds: 700,
  openingC: 90,
  noiseK: 0.3,
  ambientC: 16,
  regulation: { offsetK: 4, amplitudeK: 2.5, periodSeconds: 150, shape: 'fan-sawtooth' },
  episodes: [
    { startSeconds: 12_000, durationSeconds: 600, peakC: 117 },
    { startSeconds: 30_000, durationSeconds: 240, peakC: 113 },
  ],
});
const csv = logCsv(log, { delimiter: ';', decimal: ',', timeFormat: 'hh:mm:ss' });
const mib = (bytes: number): string => `${(bytes / 2 ** 20).toFixed(1)} MiB`;
console.log(`Log: ${ROWS.toLocaleString('en')} rows, ${mib(csv.length)} of text, 4 columns`);

// A collection before each run, so its peak is its own and not the last run's garbage.
setFlagsFromString('--expose-gc');
const collect = runInNewContext('gc') as () => void;

let peakHeap = 0;
let peakRss = 0;
const sample = (): void => {
  const m = process.memoryUsage();
  peakHeap = Math.max(peakHeap, m.heapUsed);
  peakRss = Math.max(peakRss, m.rss);
};

interface Run {
  parseMs: number;
  analyseMs: number;
  longestHoldMs: number;
  turns: number;
  baselineHeap: number;
  peakHeap: number;
  peakRss: number;
}

async function once(): Promise<Run> {
  collect();
  const baseline = process.memoryUsage();
  peakHeap = baseline.heapUsed;
  peakRss = baseline.rss;
  let longestHoldMs = 0;
  let turns = 0;
  let since = performance.now();
  const started = since;
  const result = await parseTemperatureLog(csv, {
    yieldToEventLoop: async () => {
      const now = performance.now();
      longestHoldMs = Math.max(longestHoldMs, now - since);
      turns += 1;
      sample();
      await new Promise<void>((resolve) => setImmediate(resolve));
      since = performance.now();
    },
  });
  const parsedAt = performance.now();
  if (result.status !== 'parsed') {
    throw new Error(`The bench log needs mapping: ${result.reasons.join(' ')}`);
  }
  sample();
  const analysis = analyseTemperatureLog(result.series);
  const done = performance.now();
  sample();
  if (analysis.overTemperature.episodes.length !== 2 || !analysis.opening.found) {
    throw new Error('The analysis did not find what the bench log holds.');
  }
  return {
    parseMs: parsedAt - started,
    analyseMs: done - parsedAt,
    longestHoldMs,
    turns,
    baselineHeap: baseline.heapUsed,
    peakHeap,
    peakRss,
  };
}

const runs: Run[] = [];
for (let i = 0; i < RUNS; i += 1) {
  runs.push(await once());
}
const [cold] = runs;
const warm = runs.slice(1).sort((a, b) => a.parseMs + a.analyseMs - (b.parseMs + b.analyseMs));
const median = warm[Math.floor(warm.length / 2)];
const show = (label: string, r: Run | undefined): void => {
  if (r === undefined) {
    return;
  }
  console.log(
    `${label}: parse ${r.parseMs.toFixed(0)} ms + analyse ${r.analyseMs.toFixed(0)} ms = ${(r.parseMs + r.analyseMs).toFixed(0)} ms; event loop held at most ${r.longestHoldMs.toFixed(1)} ms (${r.turns} turns); peak heap ${mib(r.peakHeap)} (+${mib(r.peakHeap - r.baselineHeap)} over the ${mib(r.baselineHeap)} before), RSS ${mib(r.peakRss)}`,
  );
};
show('First run (cold JIT)', cold);
show(`Median of ${warm.length} warm runs`, median);
console.log('Heap is sampled at each turn of the event loop and after the analysis.');
const total = (cold?.parseMs ?? 0) + (cold?.analyseMs ?? 0);
console.log(
  total < 1000 ? 'Target met: under 1 s, first run included.' : 'Target missed: over 1 s.',
);
