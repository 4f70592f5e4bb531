// A short, stable fingerprint of a definition's content, so a persisted walk can tell whether it
// belongs to exactly this tree. FNV-1a over the JSON text: no crypto needed, and it runs in the
// browser as well as on the server. It detects changes; it is not a security measure. Key order
// counts, which is stable here because definitions come out of the zod schema in its field order.
export function fingerprintOf(value: unknown): string {
  const text = JSON.stringify(value) ?? 'undefined';
  // Two 32-bit FNV-1a lanes with different offsets give a 64-bit fingerprint.
  let a = 0x811c9dc5;
  let b = 0x050c5d1f;
  for (let i = 0; i < text.length; i += 1) {
    const code = text.charCodeAt(i);
    a = Math.imul(a ^ code, 0x01000193);
    b = Math.imul(b ^ code, 0x01000193 + 0x2e);
  }
  return (a >>> 0).toString(16).padStart(8, '0') + (b >>> 0).toString(16).padStart(8, '0');
}

/**
 * The same fingerprint over a canonical form of the value: object keys sorted at every depth.
 * A definition read back from a jsonb column has its keys reordered by PostgreSQL, so this is
 * the one to compare stored content with content in code. Arrays keep their order.
 */
export function contentFingerprintOf(value: unknown): string {
  return fingerprintOf(sortKeysDeep(value));
}

function sortKeysDeep(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeysDeep);
  if (value === null || typeof value !== 'object') return value;
  return Object.fromEntries(
    Object.keys(value)
      .sort()
      .map((key) => [key, sortKeysDeep((value as Record<string, unknown>)[key])]),
  );
}
