// Reads a temperature log export into a series, or says what a person must map first, or
// refuses the file with the line at fault. The input is read once, piece by piece, with a turn
// for the event loop after each piece, so a long log does not stall the server.
import type { ColumnMapping } from '../columns/column-mapping.js';
import { TemperatureLogError } from '../errors.js';
import { detectLayout, SAMPLE_LINES } from '../format/detect-layout.js';
import type { SampleLine } from '../format/detect-layout.js';
import { decodeChunks } from '../input/decode-text.js';
import type { TextEncodingName } from '../input/decode-text.js';
import { linePieces } from '../input/line-pieces.js';
import type { LinePiece } from '../input/line-pieces.js';
import { rawChunks } from '../input/log-input.js';
import type { TemperatureLogInput } from '../input/log-input.js';
import type {
  NeedsMappingResult,
  ParseTemperatureLogResult,
} from '../series/temperature-series.js';
import { planReading } from './reading-plan.js';
import type { ReadingPlan } from './reading-plan.js';
import { RowReader } from './row-reader.js';
import type { RowLimits } from './row-reader.js';
import { MAX_ROWS, MIN_ROWS } from './value-bounds.js';
import { yieldToEventLoop } from './yield-to-event-loop.js';

export interface ParseTemperatureLogOptions {
  /** The columns a person confirmed (or the app remembered for this source signature). */
  readonly mapping?: ColumnMapping;
  /** Fewest readings accepted; default 10. */
  readonly minRows?: number;
  /** Most readings accepted; default 1,000,000. */
  readonly maxRows?: number;
  /** Characters parsed between two turns of the event loop; default 65,536. */
  readonly pieceChars?: number;
  /** Called between pieces instead of the built-in turn of the event loop (tests count these). */
  readonly yieldToEventLoop?: () => Promise<void>;
}

const MAX_LINE_CHARS = 1 << 20;

function checkOptions(options: ParseTemperatureLogOptions): void {
  const positive = (name: string, value: number | undefined): void => {
    if (value !== undefined && !(Number.isInteger(value) && value > 0)) {
      throw new TemperatureLogError('invalid-options', `${name} must be a positive whole number.`);
    }
  };
  positive('minRows', options.minRows);
  positive('maxRows', options.maxRows);
  positive('pieceChars', options.pieceChars);
}

function sampleLines(pieces: readonly LinePiece[], limit: number): SampleLine[] {
  const out: SampleLine[] = [];
  for (const piece of pieces) {
    const lines = piece.text.split('\n');
    for (let i = 0; i < lines.length && out.length < limit; i += 1) {
      const text = lines[i] ?? '';
      if (text.trim() !== '') {
        out.push({ text, line: piece.firstLine + i });
      }
    }
  }
  return out;
}

interface Settled {
  readonly plan: ReadingPlan;
  readonly reader: RowReader;
}

// Settles the layout from the pieces held so far and reads them; null while they hold no text.
function settle(
  held: LinePiece[],
  encoding: TextEncodingName | null,
  options: ParseTemperatureLogOptions,
  limits: RowLimits,
): Settled | NeedsMappingResult | null {
  const lines = sampleLines(held, SAMPLE_LINES);
  if (lines.length === 0) {
    return null;
  }
  const plan = planReading(detectLayout(lines), encoding, options.mapping);
  if ('status' in plan) {
    return plan;
  }
  const reader = new RowReader(plan, limits);
  for (const piece of held.splice(0)) {
    reader.readPiece(piece);
  }
  return { plan, reader };
}

/**
 * Parses a scan-tool or data-logger export. Resolves to the series, or to "needs mapping" with
 * the candidate columns when the file does not say which column is which (or its temperature
 * unit); rejects with TemperatureLogError, naming the line, when the file cannot be read.
 */
export async function parseTemperatureLog(
  input: TemperatureLogInput,
  options: ParseTemperatureLogOptions = {},
): Promise<ParseTemperatureLogResult> {
  checkOptions(options);
  const pause = options.yieldToEventLoop ?? yieldToEventLoop;
  const source: { encoding: TextEncodingName | null } = { encoding: null };
  const pieces = linePieces(
    decodeChunks(rawChunks(input), (e) => {
      source.encoding = e;
    }),
    { minPieceChars: options.pieceChars ?? 1 << 16, maxLineChars: MAX_LINE_CHARS },
  );
  const limits: RowLimits = {
    minRows: options.minRows ?? MIN_ROWS,
    maxRows: options.maxRows ?? MAX_ROWS,
  };

  let settled: Settled | null = null;
  const held: LinePiece[] = [];
  let lastLine = 0;
  for await (const piece of pieces) {
    lastLine = piece.firstLine + piece.lineCount - 1;
    if (settled !== null) {
      settled.reader.readPiece(piece);
    } else {
      held.push(piece);
      if (sampleLines(held, SAMPLE_LINES).length >= SAMPLE_LINES) {
        const next = settle(held, source.encoding, options, limits);
        if (next !== null && 'status' in next) {
          return next;
        }
        settled = next;
      }
    }
    await pause();
  }
  if (settled === null) {
    const next = settle(held, source.encoding, options, limits);
    if (next !== null && 'status' in next) {
      return next;
    }
    settled = next;
  }
  if (settled === null) {
    throw new TemperatureLogError(
      'empty',
      lastLine === 0 ? 'the file is empty.' : 'the file holds only blank lines.',
      { line: Math.max(1, lastLine) },
    );
  }
  return {
    status: 'parsed',
    series: {
      ...settled.reader.finish(lastLine),
      sourceSignature: settled.plan.signature,
      mapping: settled.plan.mapping,
      detected: settled.plan.detected,
    },
  };
}
