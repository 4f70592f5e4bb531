// Checks the glycol and basis options every coolant computation shares, so a form that sends a
// wrong or missing choice gets the same clear message from each of them.
import { CoolantInputError } from './errors.js';
import type { Basis, Glycol } from './glycol-tables.js';

export function readGlycol(value: unknown, field = 'glycol'): Glycol {
  if (value === 'ethylene' || value === 'propylene') {
    return value;
  }
  throw new CoolantInputError(
    field,
    'Choose the glycol: "ethylene" or "propylene". An unknown or mixed glycol cannot be converted reliably (ASTM D3321); find out which is in the system first.',
  );
}

export function readBasis(value: unknown, field = 'basis'): Basis {
  if (value === 'mass' || value === 'volume') {
    return value;
  }
  throw new CoolantInputError(field, 'Choose the basis of the percentage: "mass" or "volume".');
}
