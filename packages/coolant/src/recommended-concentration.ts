// The concentration range Heatpath advises, as warnings beside a computed figure: a mix outside
// it may still freeze where the table says, but corrosion and boil protection suffer.
//
// ASTM D3306 has concentrates used at 40–60 vol %. Heatpath advises exactly that for propylene
// glycol, whose handbook freezing table reaches 60.0 vol %. For ethylene glycol the cited table
// (ASHRAE, 0–60 mass %) ends at 57.8 vol %, and no published row beyond it could be cited (data
// above 60 mass % disagree; trade-facts.md). Rather than advise a mix it cannot give a figure for,
// Heatpath advises 40–55 vol % for ethylene glycol: every advised mix then has a cited freezing
// point (55 vol % ≈ −45 °C, colder than most climates need), with margin for a refractometer's
// ±1 K. 55–57.8 vol % still gets its figure with this warning; richer gets no figure and the
// over-concentrated warning.
import type { Glycol } from './glycol-tables.js';
import { roundForDisplay } from './display-rounding.js';
import { GLYCOL_NAMES } from './glycol-tables.js';
import { ASTM_D3306_CONCENTRATION } from './sources.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export const RECOMMENDED_VOLUME_PERCENT: Record<Glycol, { min: number; max: number }> = {
  ethylene: { min: 40, max: 55 },
  propylene: { min: 40, max: 60 },
};

/** "40–55 vol %" for the glycol, as the advice is worded everywhere. */
export function advisedRange(glycol: Glycol): string {
  const { min, max } = RECOMMENDED_VOLUME_PERCENT[glycol];
  return `${min}–${max} vol %`;
}

export function concentrationWarnings(glycol: Glycol, volumePercent: number): CoolantWarning[] {
  const { min, max } = RECOMMENDED_VOLUME_PERCENT[glycol];
  const shown = `${roundForDisplay(volumePercent, 'concentration')} vol %`;
  if (volumePercent < min) {
    return [
      warning(
        'below-recommended-concentration',
        `${shown} is below the ${advisedRange(glycol)} advised for ${GLYCOL_NAMES[glycol]} (${ASTM_D3306_CONCENTRATION.status}: 40–60 vol %); corrosion protection may be too weak even where frost protection is enough.`,
      ),
    ];
  }
  if (volumePercent > max) {
    const why =
      glycol === 'ethylene'
        ? 'ASTM D3306 allows up to 60 vol %, but the cited freezing table ends at 57.8 vol %, and a richer mix gains little frost protection while carrying heat less well'
        : 'richer mixes protect less against frost, not more, and carry heat less well';
    return [
      warning(
        'above-recommended-concentration',
        `${shown} is above the ${advisedRange(glycol)} advised for ${GLYCOL_NAMES[glycol]}: ${why}.`,
      ),
    ];
  }
  return [];
}
