// The parsed series as the database keeps it: one float64 column per channel, little-endian,
// with NaN for an empty cell. Eight bytes a reading, and reading it back is a loop over a
// buffer rather than a JSON parse of a multi-megabyte text, so a long log does not stall the
// event loop when its chart is opened.
import type { LogChannel } from '@heatpath/contracts';
import type { TemperatureSeries } from '@heatpath/temperature-log';
import type { TemperatureLog } from '../../db/models/index';

export const logChannels: readonly LogChannel[] = [
  'intakeAirC',
  'ambientC',
  'vehicleSpeedKph',
  'engineSpeedRpm',
  'fanDuty',
];

/** The series read back from its columns: what the analysis and the chart need. */
export interface StoredSeries {
  readonly times: readonly number[];
  readonly coolantC: readonly number[];
  readonly intakeAirC: readonly (number | null)[] | null;
  readonly ambientC: readonly (number | null)[] | null;
  readonly vehicleSpeedKph: readonly (number | null)[] | null;
  readonly engineSpeedRpm: readonly (number | null)[] | null;
  readonly fanDuty: readonly (number | null)[] | null;
}

export type SeriesColumns = Pick<TemperatureLog, 'times' | 'coolantC' | LogChannel>;

export function encodeChannel(values: readonly (number | null)[]): Buffer {
  const bytes = Buffer.allocUnsafe(values.length * 8);
  for (let i = 0; i < values.length; i += 1) {
    bytes.writeDoubleLE(values[i] ?? Number.NaN, i * 8);
  }
  return bytes;
}

export function decodeNumbers(bytes: Buffer): number[] {
  const out = new Array<number>(bytes.length / 8);
  for (let i = 0; i < out.length; i += 1) out[i] = bytes.readDoubleLE(i * 8);
  return out;
}

export function decodeChannel(bytes: Buffer): (number | null)[] {
  const out = new Array<number | null>(bytes.length / 8);
  for (let i = 0; i < out.length; i += 1) {
    const value = bytes.readDoubleLE(i * 8);
    out[i] = Number.isNaN(value) ? null : value;
  }
  return out;
}

export function seriesColumns(series: TemperatureSeries): SeriesColumns {
  const optional = (values: readonly (number | null)[] | null) =>
    values === null ? null : encodeChannel(values);
  return {
    times: encodeChannel(series.times),
    coolantC: encodeChannel(series.coolantC),
    intakeAirC: optional(series.intakeAirC),
    ambientC: optional(series.ambientC),
    vehicleSpeedKph: optional(series.vehicleSpeedKph),
    engineSpeedRpm: optional(series.engineSpeedRpm),
    fanDuty: optional(series.fanDuty),
  };
}

export function storedSeries(log: SeriesColumns): StoredSeries {
  const optional = (bytes: Buffer | null) => (bytes === null ? null : decodeChannel(bytes));
  return {
    times: decodeNumbers(log.times),
    coolantC: decodeNumbers(log.coolantC),
    intakeAirC: optional(log.intakeAirC),
    ambientC: optional(log.ambientC),
    vehicleSpeedKph: optional(log.vehicleSpeedKph),
    engineSpeedRpm: optional(log.engineSpeedRpm),
    fanDuty: optional(log.fanDuty),
  };
}
