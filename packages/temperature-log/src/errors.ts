// The one error Heatpath's temperature-log reader throws for a file or a request a person must
// correct. `code` is stable for the API to map; `line` is the 1-based line of the file as a text
// editor shows it (null when the problem is not on one line, such as a bad mapping), so the
// message and the upload form can point at it.
export type TemperatureLogErrorCode =
  | 'empty'
  | 'binary'
  | 'line-too-long'
  | 'single-column'
  | 'inconsistent-columns'
  | 'no-readings'
  | 'bad-quotes'
  | 'short-row'
  | 'missing-value'
  | 'not-a-number'
  | 'bad-time'
  | 'time-backwards'
  | 'no-time-span'
  | 'out-of-range'
  | 'too-few-rows'
  | 'too-many-rows'
  | 'invalid-mapping'
  | 'invalid-options';

export class TemperatureLogError extends Error {
  override readonly name = 'TemperatureLogError';
  readonly code: TemperatureLogErrorCode;
  readonly line: number | null;
  /** 0-based column index the problem is in, when it is in one column. */
  readonly column: number | null;

  constructor(
    code: TemperatureLogErrorCode,
    message: string,
    where: { line?: number | null; column?: number | null } = {},
  ) {
    const line = where.line ?? null;
    super(line === null ? message : `Line ${line}: ${message}`);
    this.code = code;
    this.line = line;
    this.column = where.column ?? null;
  }
}
