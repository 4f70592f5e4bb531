// One place for what a pressure-cap rating may be, so the pressure test and the boiling-point
// calculator refuse and warn alike.
import { CoolantInputError } from './errors.js';
import { CAP_RATING_TYPICAL } from './sources.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

/**
 * Cap ratings of 1.4–1.6 bar are common on modern cars and 0.9–1.2 bar on older ones (common
 * practice). Outside 0.5–2.0 bar a figure is unusual enough to deserve a second look; above
 * 3 bar no road-vehicle cooling system is built to run (hoses and plastic tanks would burst), so
 * the figure is a misreading — often psi typed as bar — and is refused.
 */
export const CAP_RATING_BAND = {
  usualMinBar: 0.5,
  usualMaxBar: 2.0,
  refuseAboveBar: 3.0,
} as const;

/** Returns the rating when it can be a real cap's; throws CoolantInputError when it cannot. */
export function checkCapRating(rating: number, field = 'capRatingBar'): number {
  if (rating <= 0) {
    throw new CoolantInputError(field, 'Enter the cap rating as a gauge pressure above 0 bar.');
  }
  if (rating > CAP_RATING_BAND.refuseAboveBar) {
    throw new CoolantInputError(
      field,
      `No road-vehicle pressure cap is rated ${formatBar(rating)} gauge; caps are usually 0.9–1.6 bar (13–23 psi). Check the figure stamped on the cap and the unit (psi typed as bar?).`,
    );
  }
  return rating;
}

/** A caveat for a possible but unusual rating, or null for an ordinary one. */
export function capRatingWarning(rating: number): CoolantWarning | null {
  if (rating >= CAP_RATING_BAND.usualMinBar && rating <= CAP_RATING_BAND.usualMaxBar) return null;
  return warning(
    'unusual-cap-rating',
    `A ${formatBar(rating)} cap is outside the usual ${CAP_RATING_BAND.usualMinBar}–${CAP_RATING_BAND.usualMaxBar} bar (${CAP_RATING_TYPICAL.status}); check the figure stamped on the cap or the maker's data.`,
  );
}

function formatBar(value: number): string {
  return `${Number(value.toPrecision(3))} bar`;
}
