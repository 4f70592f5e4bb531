// What a temperature log may be handed to the reader as, and one way to walk all of them. The
// package reads only what it is given: the API passes the upload stream, tests pass strings.

/** A whole file as text, any async iterable of text or byte chunks (Node streams are), or a WHATWG ReadableStream. */
export type TemperatureLogInput =
  string | AsyncIterable<string | Uint8Array> | ReadableStream<string | Uint8Array>;

function isReadableStream(input: unknown): input is ReadableStream<string | Uint8Array> {
  return (
    typeof input === 'object' &&
    input !== null &&
    typeof (input as { getReader?: unknown }).getReader === 'function'
  );
}

// Safari's ReadableStream is not async-iterable, so streams are read through their reader. Leaving
// early (a mapping is needed, or the file is bad) cancels the stream rather than leaving it locked.
async function* readStream(
  stream: ReadableStream<string | Uint8Array>,
): AsyncGenerator<string | Uint8Array> {
  const reader = stream.getReader();
  let finished = false;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) {
        finished = true;
        return;
      }
      yield value;
    }
  } finally {
    if (!finished) {
      await reader.cancel().catch(() => undefined);
    }
    reader.releaseLock();
  }
}

// A long string is handed on in slices, so decoding checks and line cutting also take turns.
const STRING_SLICE = 1 << 16;

async function* slices(text: string): AsyncGenerator<string> {
  for (let at = 0; at < text.length; at += STRING_SLICE) {
    yield text.slice(at, at + STRING_SLICE);
  }
}

/** The input as a sequence of raw chunks, whatever form it came in. */
export function rawChunks(input: TemperatureLogInput): AsyncIterable<string | Uint8Array> {
  if (typeof input === 'string') {
    return slices(input);
  }
  if (isReadableStream(input)) {
    return readStream(input);
  }
  return input;
}
