// Explicit re-exports (not `export *`) so ESM scripts run through tsx can import names from this package.
export {
  ABSOLUTE_PRESSURE_UNITS,
  ACTUAL_FLOW_UNITS,
  FLOW_UNITS,
  GAUGE_PRESSURE_UNITS,
  MASS_FLOW_UNITS,
  POWER_UNITS,
  PRESSURE_UNITS,
  STANDARD_FLOW_UNITS,
  TEMPERATURE_UNITS,
  UNITS_BY_KIND,
  isUnitOf,
  normalizeUnit,
  type AbsolutePressureUnit,
  type ActualFlowUnit,
  type FlowUnit,
  type GaugePressureUnit,
  type MassFlowUnit,
  type PowerUnit,
  type PressureUnit,
  type StandardFlowUnit,
  type TemperatureUnit,
  type UnitListKind,
} from './unit-strings';
export { UnitError } from './unit-error';
export { decimalsFor, figure, fixed } from './figure';
export {
  J_PER_KG_K_PER_BTU_PER_LB_F,
  KG_PER_LB,
  M3_PER_FT3,
  PA_PER_BAR,
  PA_PER_KPA,
  PA_PER_PSI,
  W_PER_BTU_PER_H,
  W_PER_HP,
} from './factors';
export { temperatureFromK, temperatureToK } from './temperature';
export { STANDARD_ATMOSPHERE_PA, isGaugePressureUnit, pressureFromPa, pressureToPa } from './pressure';
export {
  MAX_SITE_ALTITUDE_M,
  MIN_SITE_ALTITUDE_M,
  geopotentialAltitudeM,
  standardAtmospherePressurePa,
  standardAtmosphereTemperatureK,
} from './standard-atmosphere';
export { powerFromW, powerToW } from './power';
export { STANDARD_FLOW_BASES, flowFromKgPerS, flowToKgPerS, type FlowContext, type StandardFlowBasis } from './flow';
export { SI_UNIT_BY_KIND, convertQuantity, fromSi, toSi, type ConversionContext, type QuantityKind } from './quantity';
export { SYSTEM_UNITS, systemOfUnits, unitLabel, type UnitFamily, type UnitSystem } from './unit-systems';
