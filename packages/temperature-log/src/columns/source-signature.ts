// A stable name for "files like this one", so the app can remember the mapping a person chose
// and apply it to the next export from the same scan tool or logger. It is built from what stays
// the same between two exports of one source: the delimiter and the normalised header (or, for a
// file without a header, the column count and what each column's values look like), never from
// the readings themselves.
import type { LogLayout } from '../format/detect-layout.js';
import { timeShapeOf } from '../format/time-value.js';
import { normaliseHeader } from './header-words.js';

const SIGNATURE_VERSION = 'tl1';

// FNV-1a over UTF-16 code units, run twice with different offsets for 64 bits of spread; a
// signature only has to tell sources apart within one workshop, not resist tampering.
function fnv1a(text: string, offset: number): string {
  let hash = offset >>> 0;
  for (let i = 0; i < text.length; i += 1) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash.toString(16).padStart(8, '0');
}

function cellShape(cell: string): string {
  const t = cell.trim();
  if (t === '') {
    return 'empty';
  }
  return timeShapeOf(t) ?? 'text';
}

/** The text the signature is a hash of (exposed for tests and for debugging a mismatch). */
export function signatureText(layout: LogLayout): string {
  const delimiter = layout.delimiter === '\t' ? 'tab' : layout.delimiter;
  if (layout.headerLine !== null) {
    const names = layout.headers.map((h) => normaliseHeader(h ?? '')).join('\u001f');
    return `${SIGNATURE_VERSION}|${delimiter}|header|${names}`;
  }
  const first = layout.sampleRows[0]?.cells ?? [];
  const shapes = Array.from({ length: layout.columnCount }, (_, i) => cellShape(first[i] ?? ''));
  return `${SIGNATURE_VERSION}|${delimiter}|no-header|${layout.columnCount}|${shapes.join(',')}`;
}

/** "tl1-" and 16 hex digits. */
export function sourceSignature(layout: LogLayout): string {
  const text = signatureText(layout);
  return `${SIGNATURE_VERSION}-${fnv1a(text, 0x811c9dc5)}${fnv1a(text, 0x01234567)}`;
}
