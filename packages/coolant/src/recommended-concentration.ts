// The concentration range the coolant standard asks for, as warnings beside a computed figure:
// a mix outside it may still freeze where the table says, but corrosion and boil protection suffer.
import { ASTM_D3306_CONCENTRATION } from './sources.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

export const RECOMMENDED_VOLUME_PERCENT = { min: 40, max: 60 } as const;

export function concentrationWarnings(volumePercent: number): CoolantWarning[] {
  if (volumePercent < RECOMMENDED_VOLUME_PERCENT.min) {
    return [
      warning(
        'below-recommended-concentration',
        `${volumePercent.toFixed(1)} vol % is below the 40–60 vol % coolant concentrates are meant to be used at (${ASTM_D3306_CONCENTRATION.status}); corrosion protection may be too weak even where frost protection is enough.`,
      ),
    ];
  }
  if (volumePercent > RECOMMENDED_VOLUME_PERCENT.max) {
    return [
      warning(
        'above-recommended-concentration',
        `${volumePercent.toFixed(1)} vol % is above the 40–60 vol % coolant concentrates are meant to be used at (${ASTM_D3306_CONCENTRATION.status}); over-concentrated, protection falls again.`,
      ),
    ];
  }
  return [];
}
