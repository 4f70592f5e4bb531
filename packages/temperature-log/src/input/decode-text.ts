// Turns byte chunks into text. Scan tools and loggers write UTF-8, UTF-16 with a byte-order mark,
// or a Windows code page (the "°" of a header is then byte 0xB0, invalid as UTF-8). The encoding
// is decided once, from the byte-order mark or from whether the first 4 KiB are valid UTF-8, so a
// header's degree sign is read right and the rest of the file is decoded the same way.

export type TextEncodingName = 'utf-8' | 'utf-16le' | 'utf-16be' | 'windows-1252';

const SNIFF_BYTES = 4096;

// @types/node declares TextDecoder as a value only; this names its instances in Node and browsers.
type Decoder = InstanceType<typeof TextDecoder>;

function concatBytes(parts: readonly Uint8Array[]): Uint8Array {
  const total = parts.reduce((n, p) => n + p.length, 0);
  const out = new Uint8Array(total);
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

function encodingFromBom(
  bytes: Uint8Array,
): { encoding: TextEncodingName; bomLength: number } | null {
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) {
    return { encoding: 'utf-8', bomLength: 3 };
  }
  if (bytes[0] === 0xff && bytes[1] === 0xfe) {
    return { encoding: 'utf-16le', bomLength: 2 };
  }
  if (bytes[0] === 0xfe && bytes[1] === 0xff) {
    return { encoding: 'utf-16be', bomLength: 2 };
  }
  return null;
}

function isValidUtf8Start(bytes: Uint8Array): boolean {
  try {
    // stream: true tolerates a character cut in half at the end of the sniffed bytes.
    new TextDecoder('utf-8', { fatal: true }).decode(bytes, { stream: true });
    return true;
  } catch {
    return false;
  }
}

function decoderFor(encoding: TextEncodingName): Decoder {
  // ignoreBOM keeps the decoder from eating a mark we have already skipped, or from hiding one.
  return new TextDecoder(encoding, { ignoreBOM: true });
}

function chooseEncoding(bytes: Uint8Array): { encoding: TextEncodingName; bomLength: number } {
  return (
    encodingFromBom(bytes) ?? {
      encoding: isValidUtf8Start(bytes) ? 'utf-8' : 'windows-1252',
      bomLength: 0,
    }
  );
}

/**
 * Decodes the chunks to text. Text chunks pass through (with a leading byte-order mark removed);
 * `onEncoding` hears the encoding chosen for byte input, once.
 */
export async function* decodeChunks(
  source: AsyncIterable<string | Uint8Array>,
  onEncoding: (encoding: TextEncodingName) => void,
): AsyncGenerator<string> {
  const state: { decoder: Decoder | null; sniffed: Uint8Array[]; first: boolean } = {
    decoder: null,
    sniffed: [],
    first: true,
  };

  // Decides the encoding from the bytes held back so far and decodes them.
  const startDecoding = (): string => {
    const bytes = concatBytes(state.sniffed);
    state.sniffed = [];
    const choice = chooseEncoding(bytes);
    onEncoding(choice.encoding);
    state.decoder = decoderFor(choice.encoding);
    return state.decoder.decode(bytes.subarray(choice.bomLength), { stream: true });
  };

  for await (const chunk of source) {
    let text: string;
    if (typeof chunk === 'string') {
      text = state.first && chunk.startsWith('\uFEFF') ? chunk.slice(1) : chunk;
    } else if (state.decoder !== null) {
      text = state.decoder.decode(chunk, { stream: true });
    } else {
      state.sniffed.push(chunk);
      if (state.sniffed.reduce((n, p) => n + p.length, 0) < SNIFF_BYTES) {
        continue;
      }
      text = startDecoding();
    }
    state.first = false;
    if (text !== '') {
      yield text;
    }
  }

  const tail = state.decoder === null ? (state.sniffed.length > 0 ? startDecoding() : '') : '';
  const rest = tail + (state.decoder === null ? '' : state.decoder.decode());
  if (rest !== '') {
    yield rest;
  }
}
