// Boiling point of water under the pressure cap, for the "boiling margin" check: how close the
// running temperature is to flashing to steam at the cap's rating.
import { CAP_RATING_BAND, checkCapRating } from './cap-rating.js';
import { CoolantInputError } from './errors.js';
import { IAPWS_IF97_SATURATION } from './sources.js';
import type { SourceNote } from './sources.js';
import { toCanonical } from './units.js';
import type { QuantityInput } from './units.js';
import { warning } from './warnings.js';
import type { CoolantWarning } from './warnings.js';

/** Standard atmosphere, added to a gauge reading to get absolute pressure. */
export const STANDARD_ATMOSPHERE_BAR = 1.01325;

// IAPWS-IF97 region 4, saturation-temperature (backward) equation, coefficients n1..n10.
const N = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.1202082470247e5,
  -0.32325550322333e7, 0.1491510861353e2, -0.48232657361591e4, 0.40511340542057e6,
  -0.23855557567849, 0.65017534844798e3,
] as const;

// The equation's stated range: triple-point pressure to the critical pressure.
const P_MIN_MPA = 611.213e-6;
const P_MAX_MPA = 22.064;

const MIX_STATEMENT =
  'This is the boiling point of plain water. A glycol–water mix boils higher than water at the same pressure; Heatpath shows no figure for the mix until a published source for it is cited, so treat this as the lower, cautious figure.';

/** Saturation temperature of water in kelvin at absolute pressure `pMPa` (IAPWS-IF97 eq. 31). */
export function saturationTemperatureKelvin(pMPa: number): number {
  if (!(pMPa >= P_MIN_MPA && pMPa <= P_MAX_MPA)) {
    throw new RangeError(`IAPWS-IF97 saturation line covers ${P_MIN_MPA}–${P_MAX_MPA} MPa.`);
  }
  const [n1, n2, n3, n4, n5, n6, n7, n8, n9, n10] = N;
  const beta = pMPa ** 0.25;
  const e = beta * beta + n3 * beta + n6;
  const f = n1 * beta * beta + n4 * beta + n7;
  const g = n2 * beta * beta + n5 * beta + n8;
  const d = (2 * g) / (-f - Math.sqrt(f * f - 4 * e * g));
  return (n10 + d - Math.sqrt((n10 + d) ** 2 - 4 * (n9 + n10 * d))) / 2;
}

export interface BoilingPointOptions {
  /** Gauge pressure: bar as a number, or typed such as "15 psi". */
  readonly gaugeBar: QuantityInput;
}

export interface BoilingPointResult {
  /** Water's saturation temperature in °C at the given gauge pressure. */
  readonly celsius: number;
  readonly absoluteBar: number;
  readonly gaugeBar: number;
  /** Always shown with the figure: a mix boils higher, and no mix figure is given. */
  readonly mixStatement: string;
  readonly warnings: readonly CoolantWarning[];
  readonly source: SourceNote;
}

/** Water's boiling point at `gaugeBar` + 1.01325 bar absolute. */
export function boilingPoint(options: BoilingPointOptions): BoilingPointResult {
  const gaugeBar = toCanonical(options.gaugeBar, 'pressure', 'gaugeBar');
  return boilingPointOf(gaugeBar);
}

export function boilingPointOf(gaugeBar: number): BoilingPointResult {
  const absoluteBar = gaugeBar + STANDARD_ATMOSPHERE_BAR;
  const pMPa = absoluteBar / 10;
  if (pMPa < P_MIN_MPA || pMPa > P_MAX_MPA) {
    throw new CoolantInputError(
      'gaugeBar',
      `${gaugeBar} bar gauge is outside the range of the water saturation equation (${(P_MIN_MPA * 10 - STANDARD_ATMOSPHERE_BAR).toFixed(4)} to ${(P_MAX_MPA * 10 - STANDARD_ATMOSPHERE_BAR).toFixed(1)} bar gauge).`,
    );
  }
  if (gaugeBar > CAP_RATING_BAND.refuseAboveBar) {
    // Above any cap a road vehicle carries: a misreading (psi typed as bar?), not a figure to
    // compute a boiling point for.
    checkCapRating(gaugeBar, 'gaugeBar');
  }
  const warnings: CoolantWarning[] = [];
  if (gaugeBar < 0) {
    warnings.push(
      warning(
        'vacuum',
        'A negative gauge pressure is a partial vacuum: water boils below 100 °C here.',
      ),
    );
  } else if (gaugeBar > CAP_RATING_BAND.usualMaxBar) {
    warnings.push(
      warning(
        'above-usual-cap-pressure',
        `Above ${CAP_RATING_BAND.usualMaxBar} bar gauge is beyond the usual pressure-cap ratings (1.4–1.6 bar common on modern cars; common practice); check the reading.`,
      ),
    );
  }
  return {
    celsius: saturationTemperatureKelvin(pMPa) - 273.15,
    absoluteBar,
    gaugeBar,
    mixStatement: MIX_STATEMENT,
    warnings,
    source: IAPWS_IF97_SATURATION,
  };
}
