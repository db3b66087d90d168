/**
 * The sizing engine's entry point: heater and compressor sizing on top of lib/thermo and lib/units.
 * Pure: no framework, database or React imports.
 */
export { calculate } from './calculate';
export { EQUATION_NAMES, METHOD_NAMES, headlineMethod } from './headline-method';
// Explicit re-exports (not `export *`) so ESM scripts run through tsx can import names from this package.
export { ENGINE_VERSION, calculateCore } from './calculate-core';
export { SizingInputError, type SizingIssue } from './input-error';
export {
  DEFAULT_MECHANICAL_EFFICIENCY,
  LIMITS,
  compressorRequestSchema,
  heaterRequestSchema,
  sizingRequestSchema,
  type CompressorInput,
  type GasInput,
  type HeaterInput,
  type QuantityInput,
  type SizingInput,
  type SizingRequest,
} from './schema';
export type {
  BasisInfo,
  CompressionMethodResult,
  CoolerResult,
  CompressorBlock,
  CompressorResult,
  CompressorStage,
  FlowSummary,
  GasSummary,
  HeaterBlock,
  HeaterElectrical,
  HeaterResult,
  MotorDrive,
  MotorSelection,
  PropertyPoint,
  Severity,
  SizingResult,
  SizingWarning,
  StandardFlowBasisInfo,
} from './result-types';
export { sizeHeater, absorbedDutyKw, averageCpDutyKw, DESIGN_DUTY_CONVENTION, type HeaterCase } from './heater';
export { sizeCompressor, suggestStages, DEFAULT_DISCHARGE_LIMIT_K, type CompressorCase } from './compressor';
export { isentropicFromPolytropic, stagePressureRatio } from './compression';
export { DEFAULT_HEATER_RATINGS_KW, selectRating } from './ratings';
export { IEC_MOTOR_RATINGS_KW, NEMA_MOTOR_RATINGS_HP, MOTOR_MARGIN_PERCENT, selectMotor } from './motor-ratings';
export {
  CONTINUOUS_LOAD_FACTOR,
  DEFAULT_SUPPLY,
  SUBDIVISION_LIMIT_A,
  continuousCurrentA,
  lineCurrentA,
} from './electrical';
