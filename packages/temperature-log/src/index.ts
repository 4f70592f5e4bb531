// Public API of @heatpath/temperature-log: reads scan-tool and data-logger temperature exports
// into a series and analyses it (warm-up, thermostat opening, peak, over-temperature episodes,
// swings, rate of rise), with candidate readings for the walk. No I/O beyond the input handed in.
export { TemperatureLogError } from './errors.js';
export type { TemperatureLogErrorCode } from './errors.js';

export { parseTemperatureLog } from './parse/parse-temperature-log.js';
export type { ParseTemperatureLogOptions } from './parse/parse-temperature-log.js';
export type { TemperatureLogInput } from './input/log-input.js';
export type { TextEncodingName } from './input/decode-text.js';
export { MAX_ROWS, MIN_ROWS, VALUE_BOUNDS } from './parse/value-bounds.js';
export type { ValueBounds } from './parse/value-bounds.js';
export type {
  DetectedFormat,
  NeedsMappingResult,
  ParsedResult,
  ParseTemperatureLogResult,
  ResolvedMapping,
  TemperatureSeries,
} from './series/temperature-series.js';
export { COLUMN_ROLES, ROLE_LABELS } from './columns/column-roles.js';
export type { ColumnRole } from './columns/column-roles.js';
export type {
  CandidateColumn,
  ColumnMapping,
  MappingField,
  PlainTimeUnit,
} from './columns/column-mapping.js';
export type { SpeedUnit, TemperatureUnit } from './columns/stated-units.js';
export type { Delimiter } from './format/detect-layout.js';
export type { DecimalMark } from './format/number-value.js';
export type { TimeFormat } from './format/time-value.js';

export { analyseTemperatureLog, ANALYSIS_VERSION } from './analysis/analyse-temperature-log.js';
export type {
  AnalysableSeries,
  TemperatureLogAnalysis,
} from './analysis/analyse-temperature-log.js';
export {
  DEFAULT_ANALYSIS_OPTIONS,
  MAP_CONTROLLED_OVER_TEMPERATURE_C,
} from './analysis/analysis-options.js';
export type {
  AnalyseTemperatureLogOptions,
  EngineFacts,
  ResolvedAnalysisOptions,
} from './analysis/analysis-options.js';
export { MAP_CONTROLLED_PART_LOAD_C, TYPICAL_OPENING_C } from './analysis/result-basis.js';
export { engineFactsFromDescription } from './analysis/engine-facts.js';
export { STOPPED_BELOW_RPM } from './analysis/engine-running.js';
export type { ShroudReleaseReading, ShroudReleaseResult } from './analysis/shroud-release.js';
export type { ResultBasis } from './analysis/result-basis.js';
export type { NotFound, OpeningResult, RiseRateResult, WarmUpResult } from './analysis/warm-up.js';
export type {
  AmbientResult,
  PeakResult,
  SettledResult,
  TimeToTargetResult,
} from './analysis/log-readings.js';
export type { OverTemperatureEpisode, OverTemperatureResult } from './analysis/over-temperature.js';
export type { SwingEpisode, SwingResult, SwingSuggestion } from './analysis/swings.js';

export { candidateReadings } from './readings/candidate-readings.js';
export type { CandidateReading, CandidateReadingName } from './readings/candidate-readings.js';
