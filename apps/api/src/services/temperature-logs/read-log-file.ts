// Reads a log file's bytes with the temperature-log package. The bytes are handed over in 64 KiB
// pieces, and the parser takes a turn of the event loop after each, so a 100,000-reading log does
// not hold up other requests. Its refusals become 400s carrying its own message, which names the
// line at fault; a mapping that does not fit the file is a 400 on the "mapping" field.
import { parseTemperatureLog, TemperatureLogError } from '@heatpath/temperature-log';
import type { ColumnMapping, ParseTemperatureLogResult } from '@heatpath/temperature-log';
import { AppError } from '../../errors';

const pieceBytes = 64 * 1024;

async function* piecesOf(bytes: Buffer): AsyncGenerator<Uint8Array> {
  for (let offset = 0; offset < bytes.length; offset += pieceBytes) {
    yield bytes.subarray(offset, offset + pieceBytes);
  }
}

export async function readLogFile(options: {
  bytes: Buffer;
  mapping?: ColumnMapping | undefined;
}): Promise<ParseTemperatureLogResult> {
  try {
    return await parseTemperatureLog(
      piecesOf(options.bytes),
      options.mapping ? { mapping: options.mapping } : {},
    );
  } catch (error) {
    if (!(error instanceof TemperatureLogError)) throw error;
    if (error.code === 'invalid-mapping') {
      throw new AppError('validation_failed', error.message, { mapping: error.message });
    }
    throw new AppError('bad_request', error.message, { file: error.message });
  }
}

/** Reads a stored file back into memory (logs are at most 20 MB). */
export async function readStoredBytes(stream: AsyncIterable<Buffer | string>): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) {
    chunks.push(typeof chunk === 'string' ? Buffer.from(chunk) : chunk);
  }
  return Buffer.concat(chunks);
}
