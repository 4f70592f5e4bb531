// The parsed log: one array per channel, index i being the i-th reading, temperatures in °C and
// times in seconds from the first reading. Plain arrays (nulls for gaps) so it stores as JSON.
import type {
  CandidateColumn,
  ColumnMapping,
  MappingField,
  MappingProposal,
} from '../columns/column-mapping.js';
import type { SpeedUnit, TemperatureUnit } from '../columns/stated-units.js';
import type { TextEncodingName } from '../input/decode-text.js';
import type { Delimiter } from '../format/detect-layout.js';
import type { DecimalMark } from '../format/number-value.js';
import type { TimeFormat } from '../format/time-value.js';

/** How the file was read, as found in it. */
export interface DetectedFormat {
  /** null when the log was handed over as text. */
  readonly encoding: TextEncodingName | null;
  readonly delimiter: Delimiter;
  /** The decimal mark the first readings use; null when they are whole numbers. */
  readonly decimal: DecimalMark | null;
  readonly header: boolean;
  readonly headerLine: number | null;
  readonly unitLine: number | null;
  readonly preambleLines: number;
  readonly firstDataLine: number;
  readonly columnCount: number;
  /** The time column's format; null while the time column is not known. */
  readonly timeFormat: TimeFormat | null;
  /** The temperature unit the header states; null when it says nothing (or contradicts itself). */
  readonly unit: TemperatureUnit | null;
}

/** The mapping a series was read with, with every unit settled. */
export interface ResolvedMapping extends ColumnMapping {
  readonly temperatureUnit: TemperatureUnit;
  readonly vehicleSpeedUnit: SpeedUnit;
}

export interface TemperatureSeries {
  /** Seconds from the first reading; never decreasing. */
  readonly times: readonly number[];
  readonly coolantC: readonly number[];
  /** Optional channels: null when not in the mapping; a null value is an empty cell. */
  readonly intakeAirC: readonly (number | null)[] | null;
  readonly ambientC: readonly (number | null)[] | null;
  readonly vehicleSpeedKph: readonly (number | null)[] | null;
  readonly engineSpeedRpm: readonly (number | null)[] | null;
  /** As logged: percent duty, or 0/1 for a switched fan. */
  readonly fanDuty: readonly (number | null)[] | null;
  readonly rows: number;
  /** Lines with an empty coolant cell (a logger writing channels at different rates). */
  readonly skippedRows: number;
  /** The first reading's time as written, when the file gives clock times or timestamps. */
  readonly startedAt: string | null;
  readonly sourceSignature: string;
  readonly mapping: ResolvedMapping;
  readonly detected: DetectedFormat;
}

/** A file whose columns a person has to confirm before it can be read. */
export interface NeedsMappingResult {
  readonly status: 'needs-mapping';
  readonly sourceSignature: string;
  readonly detected: DetectedFormat;
  readonly columns: readonly CandidateColumn[];
  /** Heatpath's proposal, to pre-fill the form. */
  readonly proposed: MappingProposal['proposed'];
  readonly unsure: readonly MappingField[];
  readonly reasons: readonly string[];
}

export interface ParsedResult {
  readonly status: 'parsed';
  readonly series: TemperatureSeries;
}

export type ParseTemperatureLogResult = ParsedResult | NeedsMappingResult;
