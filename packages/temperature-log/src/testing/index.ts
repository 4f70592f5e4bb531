// Test helpers for other packages' tests (the API's upload tests, the browser tests): seeded
// synthetic logs with known answers, and a writer for every layout the reader accepts.
export { gaussian, seededRandom } from './seeded-random.js';
export type { Random } from './seeded-random.js';
export { syntheticLog } from './synthetic-log.js';
export type {
  SyntheticEpisode,
  SyntheticLog,
  SyntheticLogSpec,
  SyntheticRegulation,
  SyntheticSettle,
  SyntheticShroud,
  SyntheticSwitchOff,
  SyntheticTruth,
} from './synthetic-log.js';
export { logCsv } from './log-csv.js';
export type { CsvLayout, CsvSeries } from './log-csv.js';
