// Converts a glycol concentration between mass % and volume % using the handbook table's own
// paired columns, so the conversion agrees exactly with the table at its rows.
import { CoolantInputError } from './errors.js';
import { readBasis, readGlycol } from './glycol-options.js';
import { GLYCOL_CURVES, GLYCOL_NAMES } from './glycol-tables.js';
import type { Basis, Glycol } from './glycol-tables.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';

export interface ConvertBasisOptions {
  readonly glycol: Glycol;
  readonly percent: QuantityInput;
  readonly from: Basis;
  readonly to: Basis;
}

/** Mass % ↔ volume %; null beyond the table's richest row, where the table pairs no columns. */
export function convertBasis(options: ConvertBasisOptions): number | null {
  const glycol = readGlycol(options.glycol);
  const from = readBasis(options.from, 'from');
  const to = readBasis(options.to, 'to');
  const percent = toCanonical(options.percent, 'percentage', 'percent');
  return convertPercent(glycol, percent, from, to);
}

export function convertPercent(
  glycol: Glycol,
  percent: number,
  from: Basis,
  to: Basis,
): number | null {
  if (from === to) {
    return percent;
  }
  const curves = GLYCOL_CURVES[glycol];
  if (percent > curves.maxPercent[from]) {
    return null;
  }
  return from === 'volume' ? curves.massFromVolume(percent) : curves.volumeFromMass(percent);
}

/** Volume % for checks that are stated by volume (ASTM D3306); throws past the table. */
export function volumePercentOf(
  glycol: Glycol,
  percent: number,
  basis: Basis,
  field: string,
): number {
  const v = convertPercent(glycol, percent, basis, 'volume');
  if (v === null) {
    throw new CoolantInputError(
      field,
      `${percent} ${basis} % ${GLYCOL_NAMES[glycol]} is beyond the handbook table (it ends at ${GLYCOL_CURVES[glycol].maxPercent[basis]} ${basis} %).`,
    );
  }
  return v;
}
