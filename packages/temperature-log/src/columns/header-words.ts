// Header text as words, so "Coolant (°F)", "ECT_F" and "coolant temp degF" can be matched by
// the same rules. Degree signs are kept with their letter ("°f"), underscores and brackets split.

/** Lower-case, Unicode-normalised, single-spaced header text (the form the source signature uses). */
export function normaliseHeader(text: string): string {
  // The ordinal sign some exports use for a degree becomes "o" under NFKC, so it goes first.
  return text
    .replace(/º/g, '°')
    .normalize('NFKC')
    .replace(/^\uFEFF/, '')
    .toLowerCase()
    .replace(/\s+/g, ' ')
    .trim();
}

/** The words of a header: "Coolant temp (°F)" → ["coolant", "temp", "°f"]. */
export function headerWords(text: string): string[] {
  return normaliseHeader(text)
    .replace(/℃/g, ' °c ')
    .replace(/℉/g, ' °f ')
    .replace(/°\s+([cf])\b/g, '°$1')
    .replace(/°/g, ' °')
    .split(/[^a-z0-9°%/]+/)
    .flatMap((w) => (w === 'km/h' ? [w] : w.split('/')))
    .filter((w) => w !== '');
}
