// How each analysis result was reached and how far to trust it, in words the technician sees
// beside the value. No result here is a maker's figure or a published test.

export interface ResultBasis {
  /** One or two sentences on how the value was computed. */
  readonly method: string;
  /** Whose method and thresholds these are, and what overrides them. */
  readonly status: string;
}

export const STATUS = {
  readFromLog:
    'Read straight from the log (the highest single reading, so one noisy reading can set it).',
  heatpathMethod:
    'Heatpath’s method, not a published standard; check it on the chart before using the value.',
  heatpathThreshold:
    'Heatpath’s method with Heatpath’s default threshold; normal running is about 90–105 °C (common practice) and a maker’s figure for the engine overrides.',
  heatpathThresholdMapControlled:
    'Heatpath’s method with Heatpath’s threshold for a map-controlled thermostat; such engines hold 100–110 °C at part load (common practice), so only what rises above that counts. A maker’s figure for the engine overrides.',
  heatpathSwings:
    'Heatpath’s method; the 3 K smallest swing and 3 cycles are Heatpath’s choices, not published figures.',
} as const;

/** Usual thermostat opening temperatures (published trade textbook site; medium confidence). */
export const TYPICAL_OPENING_C = { min: 82, max: 91 } as const;

/**
 * Where a map-controlled thermostat holds the coolant at part load (common practice; it opens
 * further toward 90 °C under full load). cooling-diagnosis.md, traps a skilled technician avoids.
 */
export const MAP_CONTROLLED_PART_LOAD_C = { min: 100, max: 110 } as const;
