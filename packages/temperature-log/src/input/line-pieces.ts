// Cuts decoded text into pieces of whole lines, so each piece can be parsed on its own and the
// event loop gets a turn between pieces. Line breaks (CRLF, LF, or a lone CR) become "\n", and
// every piece knows the file line it starts on, which is what error messages quote.
// Heatpath reads one reading per line, so a piece may be cut at any line break.
import { TemperatureLogError } from '../errors.js';
import { binaryKindHint, firstNonTextIndex } from './binary-check.js';

export interface LinePiece {
  /** Whole lines joined by "\n", without a final line break. */
  readonly text: string;
  /** 1-based file line of the piece's first line. */
  readonly firstLine: number;
  /** How many lines the piece holds. */
  readonly lineCount: number;
}

export interface LinePieceOptions {
  /** Pieces are cut at about this many characters (whole lines; the last piece may be shorter). */
  readonly minPieceChars: number;
  /** A line longer than this is not a log line; reading stops rather than buffering the file. */
  readonly maxLineChars: number;
}

function countNewlines(text: string, from = 0, to = text.length): number {
  let n = 0;
  let at = text.indexOf('\n', from);
  while (at !== -1 && at < to) {
    n += 1;
    at = text.indexOf('\n', at + 1);
  }
  return n;
}

export async function* linePieces(
  chunks: AsyncIterable<string>,
  options: LinePieceOptions,
): AsyncGenerator<LinePiece> {
  let carry = '';
  let pendingCarriageReturn = false;
  let linesBefore = 0;
  let fileStart = '';

  const take = (end: number): LinePiece => {
    const text = carry.slice(0, end);
    carry = carry.slice(end + 1);
    const lineCount = countNewlines(text) + 1;
    const piece = { text, firstLine: linesBefore + 1, lineCount };
    linesBefore += lineCount;
    return piece;
  };

  for await (const chunk of chunks) {
    // A CR at the end of a chunk may be the first half of a CRLF: decide with the next chunk.
    let text: string = (pendingCarriageReturn ? '\r' : '') + chunk;
    pendingCarriageReturn = text.endsWith('\r');
    if (pendingCarriageReturn) {
      text = text.slice(0, -1);
    }
    text = text.replace(/\r\n?/g, '\n');
    if (fileStart.length < 16) {
      fileStart += text.slice(0, 16 - fileStart.length);
    }

    const bad = firstNonTextIndex(text);
    if (bad !== -1) {
      const line = linesBefore + countNewlines(carry) + countNewlines(text, 0, bad) + 1;
      throw new TemperatureLogError(
        'binary',
        `the file contains binary data (character code ${text.charCodeAt(bad)}), so it is not a text export. ${binaryKindHint(fileStart)}`,
        { line },
      );
    }

    carry += text;
    while (carry.length >= options.minPieceChars) {
      // Cut at the last line break within the piece size, so one huge chunk still becomes many
      // pieces; a line longer than that goes whole.
      let end = carry.lastIndexOf('\n', options.minPieceChars);
      if (end === -1) {
        end = carry.indexOf('\n');
      }
      if (end === -1) {
        break;
      }
      yield take(end);
    }
    if (carry.length > options.maxLineChars && carry.indexOf('\n') === -1) {
      throw new TemperatureLogError(
        'line-too-long',
        `this line is longer than ${options.maxLineChars.toLocaleString('en')} characters, so the file is not a log export with one reading per line.`,
        { line: linesBefore + 1 },
      );
    }
  }

  // A file's last line break ends its last line; it does not start an empty one.
  if (carry.endsWith('\n')) {
    carry = carry.slice(0, -1);
  }
  if (carry !== '') {
    yield take(carry.length);
  }
}
