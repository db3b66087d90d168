// Explicit re-exports (not `export *`) so ESM scripts run through tsx can import names from this CJS-typed package.
export {
  GAS_CONSTANT_J_PER_MOL_K,
  MAX_TEMPERATURE_K,
  MID_TEMPERATURE_K,
  MIN_TEMPERATURE_K,
  PROPERTY_SOURCE,
  STANDARD_STATE_PRESSURE_PA,
  ZERO_CELSIUS_K,
} from './constants';
export { MixtureError, ThermoRangeError } from './errors';
export { SPECIES, SPECIES_IDS, isSpeciesId, type SpeciesData, type SpeciesId } from './species-data';
export { CRITICAL_CONSTANTS, type CriticalConstants } from './critical-constants';
export { compileGas, type GasModel } from './gas-model';
export {
  cpMass,
  cpMolar,
  cvMass,
  densityKgPerM3,
  enthalpyMass,
  enthalpyMolar,
  heatCapacityRatio,
  standardEntropyMass,
  standardEntropyMolar,
} from './properties';
export { temperatureFromEnthalpy, temperatureFromEntropy } from './inversion';
export {
  FRACTION_SUM_TOLERANCE,
  checkComposition,
  compositionKey,
  massFractionsOf,
  type CompositionBasis,
  type CompositionCheck,
  type CompositionIssue,
  type MoleFractions,
} from './composition';
export { DRY_AIR_MOLE_FRACTIONS, DRY_AIR_SOURCE } from './dry-air';
export {
  ASHRAE_MAX_TEMPERATURE_K,
  ASHRAE_MIN_TEMPERATURE_K,
  WATER_CRITICAL_TEMPERATURE_K,
  saturationPressureAshraePa,
  saturationPressureForCheckPa,
  saturationPressureWagnerPrussPa,
} from './water-saturation';
export { humidAirAt, type HumidAirState, type HumiditySpec } from './humid-air';
export {
  GAS_PRESETS,
  PRESET_ALIASES,
  PRESET_IDS,
  findPreset,
  humidAirGas,
  mixtureGas,
  presetGas,
  type GasPreset,
} from './presets';
