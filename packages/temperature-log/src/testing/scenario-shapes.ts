// The warm-up, settling and heat-soak shapes the synthetic logs are built from, each with the
// moment that matters known in closed form. Invented data for tests; the shapes follow the
// trade's description of what a sensor at the head outlet sees (cooling-diagnosis.md; common
// practice), not any maker's figures.

export interface SyntheticShroud {
  /** Coolant temperature at which the shroud releases and the coolant starts to move, °C. */
  readonly releaseC: number;
  /** How far the sensor's reading dips as cooler coolant from the block reaches it, K; default 4. */
  readonly dipK?: number;
  /** How long the dip takes, s; default 20. */
  readonly dipSeconds?: number;
  /**
   * Time constant of the warm-up once the coolant moves, s: longer than before the release,
   * because the whole circuit's coolant now warms, not only what stands around the sensor.
   */
  readonly timeConstantAfterSeconds: number;
}

export interface WarmUpModel {
  /** Coolant temperature during the warm-up, `u` seconds after it starts (before the opening). */
  readonly valueAt: (u: number) => number;
  /** Seconds from the start of the warm-up to the opening. */
  readonly openAfter: number;
  /** The shroud's release, seconds from the start of the warm-up and °C; null without one. */
  readonly release: { readonly after: number; readonly c: number } | null;
}

/** Time for a first-order rise toward `tInf` to go from `from` to `to`, s. */
function firstOrderTime(tInf: number, from: number, to: number, tau: number): number {
  return tau * Math.log((tInf - from) / (tInf - to));
}

function firstOrder(tInf: number, from: number, tau: number, u: number): number {
  return tInf - (tInf - from) * Math.exp(-u / tau);
}

/**
 * The warm-up with the thermostat shut, T(u) = T∞ − (T∞ − T0)·e^(−u/τ); with a shroud, the same
 * up to the release, a linear dip, then a slower first-order rise from the bottom of the dip.
 */
export function warmUpModel(options: {
  startC: number;
  closedAsymptoteC: number;
  timeConstantSeconds: number;
  openingC: number;
  shroud?: SyntheticShroud;
}): WarmUpModel {
  const { startC: t0, closedAsymptoteC: tInf, timeConstantSeconds: tau, openingC } = options;
  const shroud = options.shroud;
  if (shroud === undefined) {
    return {
      valueAt: (u) => firstOrder(tInf, t0, tau, u),
      openAfter: firstOrderTime(tInf, t0, openingC, tau),
      release: null,
    };
  }
  if (!(shroud.releaseC > t0 && shroud.releaseC < openingC)) {
    throw new Error('The shroud must release between the start and the opening temperature.');
  }
  const dipK = shroud.dipK ?? 4;
  const dipSeconds = shroud.dipSeconds ?? 20;
  const releaseAfter = firstOrderTime(tInf, t0, shroud.releaseC, tau);
  const bottom = shroud.releaseC - dipK;
  const tau2 = shroud.timeConstantAfterSeconds;
  const openAfter = releaseAfter + dipSeconds + firstOrderTime(tInf, bottom, openingC, tau2);
  return {
    valueAt: (u) => {
      if (u < releaseAfter) {
        return firstOrder(tInf, t0, tau, u);
      }
      if (u < releaseAfter + dipSeconds) {
        return shroud.releaseC - (dipK * (u - releaseAfter)) / dipSeconds;
      }
      return firstOrder(tInf, bottom, tau2, u - releaseAfter - dipSeconds);
    },
    openAfter,
    release: { after: releaseAfter, c: shroud.releaseC },
  };
}

export interface SyntheticSettle {
  /** How much further the coolant climbs after the opening before it levels, K. */
  readonly riseK: number;
  /** Time constant of that climb, s. */
  readonly timeConstantSeconds: number;
}

/** The extra climb after the opening, `u` seconds after it: riseK·(1 − e^(−u/τ)). */
export function settleAt(settle: SyntheticSettle | undefined, u: number): number {
  return settle === undefined ? 0 : settle.riseK * (1 - Math.exp(-u / settle.timeConstantSeconds));
}

export interface SyntheticSwitchOff {
  /** When the engine is switched off, s from the first reading of the model. */
  readonly atSeconds: number;
  /** How far heat soak lifts the coolant above its level at switch-off, K. */
  readonly soakRiseK: number;
  /** When the soak peaks after switch-off, s; default 240. */
  readonly soakPeakAfterSeconds?: number;
}

/**
 * Heat soak `u` seconds after switch-off: riseK·(u/p)·e^(1 − u/p), which rises from zero, peaks at
 * exactly riseK at u = p and then fades as the engine cools.
 */
export function soakAt(switchOff: SyntheticSwitchOff, u: number): number {
  const p = switchOff.soakPeakAfterSeconds ?? 240;
  return switchOff.soakRiseK * (u / p) * Math.exp(1 - u / p);
}
