// Warnings travel with a result instead of being thrown: the figure is still useful, but the
// person must see the caveat beside it. Codes are stable so screens can style or translate them.

export type CoolantWarningCode =
  | 'over-concentrated'
  | 'below-recommended-concentration'
  | 'above-recommended-concentration'
  | 'no-glycol-needed'
  | 'mix-figure-not-shown'
  | 'vacuum'
  | 'above-usual-cap-pressure'
  | 'properties-extrapolated'
  | 'thermostat-may-be-closed'
  | 'no-published-band'
  | 'unusual-cap-rating'
  | 'above-cap-rating'
  | 'short-test'
  | 'test-warm-system'
  | 'pressure-rose'
  | 'large-drain'
  | 'full-replacement'
  | 'mix-after-adjusting';

export interface CoolantWarning {
  readonly code: CoolantWarningCode;
  readonly message: string;
}

export function warning(code: CoolantWarningCode, message: string): CoolantWarning {
  return { code, message };
}
