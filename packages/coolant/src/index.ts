// Public API of @heatpath/coolant: coolant and thermal computations for cooling-system
// diagnosis, each with the source of its figures. No I/O.
export { CoolantInputError } from './errors.js';
export type { SourceNote } from './sources.js';
export type { CoolantWarning, CoolantWarningCode } from './warnings.js';
export {
  CANONICAL_UNITS,
  DISPLAY_UNITS,
  formatQuantity,
  fromCanonical,
  toCanonical,
} from './units.js';
export type { DisplayUnit, FormatOptions, QuantityInput } from './units.js';
export {
  acceptsUnit,
  canonicalUnitOf,
  quantities,
  quantityInfo,
  unitCodes,
  unitSymbol,
} from './units/quantities.js';
export type { Quantity, QuantityInfo, UnitCode } from './units/quantities.js';
export {
  applyMap,
  convertDifference,
  convertUnit,
  IDENTITY_MAP,
  linearMap,
} from './units/unit-math.js';
export type { LinearMap } from './units/unit-math.js';
export type { Basis, FreezeTableRow, Glycol } from './glycol-tables.js';
export { ETHYLENE_GLYCOL_FREEZE_TABLE, PROPYLENE_GLYCOL_FREEZE_TABLE } from './glycol-tables.js';
export { convertBasis } from './concentration-basis.js';
export type { ConvertBasisOptions } from './concentration-basis.js';
export { freezePoint } from './freeze-point.js';
export type { FreezePointOptions, FreezePointResult } from './freeze-point.js';
export { concentrationForFreezePoint } from './concentration-for-freeze-point.js';
export type {
  ConcentrationForFreezePointOptions,
  ConcentrationForFreezePointResult,
} from './concentration-for-freeze-point.js';
export { boilingPoint, STANDARD_ATMOSPHERE_BAR } from './boiling-point.js';
export type { BoilingPointOptions, BoilingPointResult } from './boiling-point.js';
export { formulaFunctions } from './formula-functions.js';
export type { CoolantFormulaFunctions } from './formula-functions.js';
export { mixAdjustment } from './mix-adjustment.js';
export type { MixAdjustmentOptions, MixAdjustmentResult } from './mix-adjustment.js';
export { heatFlow } from './heat-flow.js';
export type { HeatFlowOptions, HeatFlowResult } from './heat-flow.js';
export { assessTemperatureDrop } from './temperature-drop.js';
export type {
  AssessTemperatureDropOptions,
  Circuit,
  TemperatureDropResult,
  TemperatureDropRule,
  TemperatureDropVerdict,
} from './temperature-drop.js';
export { pressureHoldRule, pressureTest } from './pressure-test.js';
export { CAP_RATING_BAND } from './cap-rating.js';
export type {
  PressureHoldRule,
  PressureTestOptions,
  PressureTestResult,
  PressureTestRule,
  PressureTestVerdict,
} from './pressure-test.js';
export { MAX_SYSTEM_LITRES } from './mix-adjustment.js';
export { HEAT_FLOW_LIMITS } from './heat-flow.js';
export {
  COOLANT_READING_LIMITS,
  isPlausibleCoolantCelsius,
  readCoolantTemperature,
} from './coolant-temperature.js';
export { PROPERTY_MAX_VOLUME_PERCENT, PROPERTY_TEMPERATURE_RANGE } from './coolant-properties.js';
export { advisedRange, RECOMMENDED_VOLUME_PERCENT } from './recommended-concentration.js';
export {
  formatFigure,
  formatSignificant,
  QUANTITY_FIGURES,
  roundForDisplay,
  roundSignificant,
  SIGNIFICANT_FIGURES,
} from './display-rounding.js';
export type { FigureKind, QuantityFigure, SignificantFigure } from './display-rounding.js';
