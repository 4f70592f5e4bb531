// Keeps a customer's personal data out of what apprentices read. The customer's name, phone and
// e-mail and the vehicle's plate and VIN are removed wherever they appear in free text (the
// complaint, notes, findings), and so is anything shaped like an e-mail address or a phone number.
export const hiddenMark = '[hidden]';

const emailPattern = /[\w.+-]+@[\w-]+(?:\.[\w-]+)+/g;
// A number written as a phone number is (+ or a leading 0, then 8+ digits, spaces or dashes);
// readings such as "110 106 52" or "1.38" are left alone.
const phonePattern = /(?<![\w.])(?:\+\d|0\d)[\d\s-]{6,}\d(?![\w.])/g;

// Whole words only, so "Ann" does not eat into "announced" nor a plate into a longer code.
const before = '(?<![\\p{L}\\p{N}])';
const after = '(?![\\p{L}\\p{N}])';
// What people put between the characters of a plate or VIN: the vehicle search ignores spaces
// and dashes, so "UX64-SEE", "U X 6 4 S E E" and "WVW ZZZ 1JZ…" are the same vehicle; dots and
// slashes are the other separators seen on job cards.
const separators = '[\\s./-]*';

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

export interface PersonalData {
  customerName?: string | null;
  phone?: string | null;
  email?: string | null;
  plate?: string | null;
  vin?: string | null;
}

/** The strings to remove: the whole values and each part of a name or plate of 3+ characters. */
export function secretsOf(data: PersonalData): string[] {
  const secrets = new Set<string>();
  const add = (value: string | null | undefined) => {
    const trimmed = value?.trim();
    if (trimmed && trimmed.length >= 2) secrets.add(trimmed);
  };
  add(data.customerName);
  const parts = data.customerName?.split(/\s+/) ?? [];
  if (parts.length > 1) for (const part of parts) if (part.length >= 3) add(part);
  add(data.phone);
  add(data.email);
  add(data.plate);
  add(data.plate?.replace(/[\s-]/g, ''));
  add(data.vin);
  // Longest first, so a whole name goes before its parts.
  return [...secrets].sort((a, b) => b.length - a.length);
}

/** Letters and digits only, upper case: how the vehicle search compares plates and VINs. */
function identifierKey(value: string): string {
  return value.replace(/[^\p{L}\p{N}]/gu, '').toUpperCase();
}

/** A plate or VIN however it is spaced or dashed: separators allowed between any characters. */
function spacedOut(key: string): string {
  return [...key].map(escapeRegExp).join(separators);
}

/**
 * The identifier patterns: the whole plate and VIN, a plate's parts that carry a digit
 * ("UX64"), and the VIN's serial (its last six characters, which identify the car on their own).
 * Letter-only plate parts ("SEE") are returned apart: they are also words, so they are only
 * taken when written in capitals as on the plate.
 */
function identifierPatterns(data: PersonalData): { anyCase: string[]; capitals: string[] } {
  const anyCase: string[] = [];
  const capitals: string[] = [];
  for (const value of [data.plate, data.vin]) {
    const key = value ? identifierKey(value) : '';
    if (key.length >= 2) anyCase.push(spacedOut(key));
  }
  for (const part of data.plate?.trim().split(/[\s-]+/) ?? []) {
    const key = identifierKey(part);
    if (key.length < 3 || key === identifierKey(data.plate ?? '')) continue;
    if (/\p{N}/u.test(key)) anyCase.push(spacedOut(key));
    else capitals.push(escapeRegExp(key));
  }
  const vin = data.vin ? identifierKey(data.vin) : '';
  if (vin.length >= 11) anyCase.push(spacedOut(vin.slice(-6)));
  return { anyCase, capitals };
}

function wholeWords(bodies: string[], flags: string): RegExp | null {
  if (bodies.length === 0) return null;
  // Longest first, so a whole value goes before its parts.
  const sorted = [...bodies].sort((a, b) => b.length - a.length);
  return new RegExp(sorted.map((body) => `${before}(?:${body})${after}`).join('|'), flags);
}

/** A redacter for one case: call it on every free-text field an apprentice will read. */
export function redacter(data: PersonalData): (text: string) => string {
  const identifiers = identifierPatterns(data);
  const personal = secretsOf({
    customerName: data.customerName,
    phone: data.phone,
    email: data.email,
  }).map((secret) => escapeRegExp(secret).replace(/\s+/g, '\\s*'));
  const anyCase = wholeWords([...identifiers.anyCase, ...personal], 'giu');
  const capitals = wholeWords(identifiers.capitals, 'gu');
  return (text: string) => {
    let out = text.replace(emailPattern, hiddenMark).replace(phonePattern, hiddenMark);
    if (anyCase) out = out.replace(anyCase, hiddenMark);
    if (capitals) out = out.replace(capitals, hiddenMark);
    return out;
  };
}
