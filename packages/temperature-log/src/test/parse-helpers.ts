// Helpers for the parser tests: parse expecting a series, expecting a mapping request, or
// expecting the file to be refused.
import { expect } from 'vitest';
import { TemperatureLogError } from '../errors.js';
import { parseTemperatureLog } from '../parse/parse-temperature-log.js';
import type { ParseTemperatureLogOptions } from '../parse/parse-temperature-log.js';
import type { TemperatureLogInput } from '../input/log-input.js';
import type { NeedsMappingResult, TemperatureSeries } from '../series/temperature-series.js';

export async function parsed(
  input: TemperatureLogInput,
  options?: ParseTemperatureLogOptions,
): Promise<TemperatureSeries> {
  const result = await parseTemperatureLog(input, options);
  if (result.status !== 'parsed') {
    throw new Error(`Expected a series, got needs-mapping: ${result.reasons.join(' ')}`);
  }
  return result.series;
}

export async function needsMapping(
  input: TemperatureLogInput,
  options?: ParseTemperatureLogOptions,
): Promise<NeedsMappingResult> {
  const result = await parseTemperatureLog(input, options);
  if (result.status !== 'needs-mapping') {
    throw new Error('Expected a mapping request, got a series.');
  }
  return result;
}

export async function refused(
  input: TemperatureLogInput,
  options?: ParseTemperatureLogOptions,
): Promise<TemperatureLogError> {
  let result: unknown;
  try {
    result = await parseTemperatureLog(input, options);
  } catch (error) {
    if (error instanceof TemperatureLogError) {
      return error;
    }
    throw error;
  }
  expect.unreachable(
    `Expected the file to be refused, got ${JSON.stringify(result).slice(0, 200)}`,
  );
  throw new Error('unreachable');
}

/** Lines joined with "\n" and a final line break, as a file. */
export function file(...lines: string[]): string {
  return `${lines.join('\n')}\n`;
}

/** n readings "t<d>T" from t = 0 s, coolant rising 0.5 K a reading from 20 °C. */
export function rows(n: number, delimiter = ',', from = 0): string[] {
  return Array.from(
    { length: n },
    (_, i) => `${from + i}${delimiter}${(20 + (from + i) * 0.5).toFixed(1)}`,
  );
}
