// Keeps a customer's personal data out of what apprentices read. The customer's name, phone and
// e-mail and the vehicle's plate and VIN are removed wherever they appear in free text (the
// complaint, notes, findings), and so is anything shaped like an e-mail address or a phone number.
export const hiddenMark = '[hidden]';

const emailPattern = /[\w.+-]+@[\w-]+(?:\.[\w-]+)+/g;
// A number written as a phone number is (+ or a leading 0, then 8+ digits, spaces or dashes);
// readings such as "110 106 52" or "1.38" are left alone.
const phonePattern = /(?<![\w.])(?:\+\d|0\d)[\d\s-]{6,}\d(?![\w.])/g;

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

/** A redacter for one case: call it on every free-text field an apprentice will read. */
export function redacter(data: PersonalData): (text: string) => string {
  const secrets = secretsOf(data);
  const pattern =
    secrets.length > 0
      ? new RegExp(
          secrets
            .map((secret) => {
              const body = escapeRegExp(secret).replace(/\s+/g, '\\s*');
              // Whole words only, so "Ann" does not eat into "announced".
              return `(?<![\\p{L}\\p{N}])${body}(?![\\p{L}\\p{N}])`;
            })
            .join('|'),
          'giu',
        )
      : null;
  return (text: string) => {
    let out = text.replace(emailPattern, hiddenMark).replace(phonePattern, hiddenMark);
    if (pattern) out = out.replace(pattern, hiddenMark);
    return out;
  };
}
