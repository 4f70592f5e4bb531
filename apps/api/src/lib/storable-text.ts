// PostgreSQL cannot store a NUL character in text, and a lone UTF-16 surrogate (half of an emoji,
// "\ud83d") is not a character at all: JSON allows both, so they are refused at the door with a
// 400 instead of failing deep in a query.

/** The path of the first string (or object key) that cannot be stored, or null. */
export function unstorableTextPath(value: unknown, path = ''): string | null {
  if (typeof value === 'string') return isStorable(value) ? null : path || '_';
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i += 1) {
      const found = unstorableTextPath(value[i], path ? `${path}.${i}` : String(i));
      if (found !== null) return found;
    }
    return null;
  }
  if (value !== null && typeof value === 'object') {
    for (const [key, inner] of Object.entries(value)) {
      const here = path ? `${path}.${key}` : key;
      if (!isStorable(key)) return here;
      const found = unstorableTextPath(inner, here);
      if (found !== null) return found;
    }
  }
  return null;
}

// A NUL, a high surrogate not followed by a low one, or a low one not preceded by a high one.
// eslint-disable-next-line no-control-regex -- finding NUL is the point
const unstorable = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

function isStorable(text: string): boolean {
  return !unstorable.test(text);
}
