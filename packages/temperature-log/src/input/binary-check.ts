// A log export is text. NUL bytes and control characters other than tab and line breaks mean
// the upload is something else: a workbook, a PDF, a picture, a logger's raw memory dump, or
// UTF-16 text without its byte-order mark.

// Tab, line feed, carriage return, and 0x1A (old DOS tools end text files with it).
function isTextControl(code: number): boolean {
  return code === 0x09 || code === 0x0a || code === 0x0d || code === 0x1a;
}

/** Index of the first character that cannot be in a text export, or -1. */
export function firstNonTextIndex(text: string): number {
  for (let i = 0; i < text.length; i += 1) {
    const code = text.charCodeAt(i);
    if ((code < 0x20 && !isTextControl(code)) || code === 0x7f) {
      return i;
    }
  }
  return -1;
}

// UTF-16 text of ASCII characters read as bytes: every other character is NUL.
function looksLikeBomlessUtf16(start: string): boolean {
  const pairs = Math.floor(Math.min(start.length, 8) / 2);
  if (pairs < 2) {
    return false;
  }
  let evenNul = 0;
  let oddNul = 0;
  for (let i = 0; i < pairs * 2; i += 1) {
    if (start.charCodeAt(i) === 0) {
      if (i % 2 === 0) {
        evenNul += 1;
      } else {
        oddNul += 1;
      }
    }
  }
  return (evenNul === pairs && oddNul === 0) || (oddNul === pairs && evenNul === 0);
}

/** A hint at what the file really is, from how it starts. */
export function binaryKindHint(start: string): string {
  if (start.startsWith('PK')) {
    return 'It looks like a compressed workbook or archive; export the log as CSV or text instead.';
  }
  if (start.startsWith('%PDF')) {
    return 'It looks like a PDF; export the log as CSV or text instead.';
  }
  if (looksLikeBomlessUtf16(start)) {
    return 'It looks like UTF-16 text without a byte-order mark; save it as UTF-8 CSV.';
  }
  return 'Upload the CSV or text export of the log, not the logger’s own file.';
}
