// Vehicle identification numbers: the 17-character form of ISO 3779 (no I, O or Q) and the
// North American check digit in position 9 defined by 49 CFR 565.15. Vehicles built for other
// markets often carry no check digit, so a mismatch is a warning, never a refusal.

const transliteration: Record<string, number> = {
  A: 1,
  B: 2,
  C: 3,
  D: 4,
  E: 5,
  F: 6,
  G: 7,
  H: 8,
  J: 1,
  K: 2,
  L: 3,
  M: 4,
  N: 5,
  P: 7,
  R: 9,
  S: 2,
  T: 3,
  U: 4,
  V: 5,
  W: 6,
  X: 7,
  Y: 8,
  Z: 9,
};
const weights = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];

export const vinPattern = /^[A-HJ-NPR-Z0-9]{17}$/;

export function normaliseVin(raw: string): string {
  return raw.replace(/[\s-]/g, '').toUpperCase();
}

/** Why a VIN is not of ISO 3779 form, or null when it is. */
export function vinFormProblem(vin: string): string | null {
  if (vin.length !== 17) return `A VIN has 17 characters; this one has ${vin.length}.`;
  const bad = vin.match(/[IOQ]/);
  if (bad)
    return `A VIN never contains the letters I, O or Q (found "${bad[0]}"; it is probably 1 or 0).`;
  if (!vinPattern.test(vin)) return 'A VIN holds only capital letters and digits.';
  return null;
}

/** The check digit 49 CFR 565.15 gives for a VIN of valid form: '0'–'9' or 'X'. */
export function vinCheckDigit(vin: string): string {
  let sum = 0;
  for (let i = 0; i < 17; i += 1) {
    const c = vin.charAt(i);
    const value = /[0-9]/.test(c) ? Number(c) : (transliteration[c] ?? 0);
    sum += value * (weights[i] ?? 0);
  }
  const remainder = sum % 11;
  return remainder === 10 ? 'X' : String(remainder);
}

export interface VinCheck {
  vin: string;
  valid: boolean;
  problem: string | null;
  checkDigit: 'matches' | 'mismatch';
  warning: string | null;
}

export function checkVin(raw: string): VinCheck {
  const vin = normaliseVin(raw);
  const problem = vinFormProblem(vin);
  if (problem) return { vin, valid: false, problem, checkDigit: 'mismatch', warning: null };
  const expected = vinCheckDigit(vin);
  const matches = vin.charAt(8) === expected;
  return {
    vin,
    valid: true,
    problem: null,
    checkDigit: matches ? 'matches' : 'mismatch',
    warning: matches
      ? null
      : `The 9th character is "${vin.charAt(8)}" but the North American check digit would be "${expected}". Vehicles built for other markets often have no check digit; check the VIN against the vehicle if it should have one.`,
  };
}
