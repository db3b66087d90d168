import type { EquationOfStateId } from '../thermo/eos/types';
import type { MoleFractions } from '../thermo/composition';

export type Severity = 'info' | 'caution' | 'warning' | 'danger';

/** A caution shown beside the figures; `code` is stable for the form and datasheets to key on. */
export type SizingWarning = { code: string; severity: Severity; message: string };

/**
 * cp, cv (J/(kg K)) and k = cp/cv at one state; with a real-gas equation also Z and the isentropic exponent
 * (which equals cp/cv only for an ideal gas).
 */
export type PropertyPoint = {
  temperatureC: number;
  cpJPerKgK: number;
  cvJPerKgK: number;
  k: number;
  z: number;
  isentropicExponent: number;
  densityKgPerM3: number;
};

export type StandardFlowBasisInfo = { unit: string; temperatureC: number; pressureKpa: number; description: string };

/** What the figures rest on; datasheets print it. */
export type BasisInfo = {
  /** The equation of state behind the headline figures. */
  equationOfState: EquationOfStateId;
  /** Why it was used (asked for, or the engine's choice and its reason). */
  equationOfStateReason: string;
  /** The equation's publication and its range of validity. */
  equationOfStateSource: string;
  /** How standard volumes were converted (real Z at the reference conditions, or ideal gas). */
  standardVolumeBasis: string;
  propertySource: string;
  gasComposition: string;
  /** Basis of a standard-volume flow input, or null for mass or actual flow. */
  flowInputBasis: StandardFlowBasisInfo | null;
  /** Bases of the standard flows reported in `flows`. */
  reportedFlowBases: StandardFlowBasisInfo[];
  barometricPressureKpa: number;
  barometricPressureSource:
    'default (101.325 kPa)' | 'site.barometricPressure' | 'site.altitudeM (ISO 2533 standard atmosphere)';
  conventions: string[];
};

export type GasSummary = {
  label: string;
  key: string;
  moleFractions: MoleFractions;
  massFractions: MoleFractions;
  molarMassKgPerKmol: number;
  gasConstantJPerKgK: number;
  /** Kay's-rule pseudo-critical constants of the mixture. */
  pseudoCriticalTemperatureK: number;
  pseudoCriticalPressureKpa: number;
};

export type FlowSummary = {
  normalM3PerH: number;
  standardM3PerH: number;
  scfm: number;
  mmscfd: number;
  /** ISO 1217 free air delivery (20 °C, 100 kPa). */
  fadM3PerMin: number;
  /** Z at the Sm3 reference conditions (15 °C, 101.325 kPa); 1 for an ideal gas. */
  standardZ: number;
};

export type HeaterElectrical = {
  voltageV: number;
  phases: 1 | 3;
  /** Power the current is figured on: the selected catalogue rating, else the design duty. */
  powerBasisKw: number;
  powerBasis: 'selected-rating' | 'design-duty';
  currentA: number;
  /** 125 % of the current, for conductors and overcurrent protection of a continuous load. */
  continuousCurrentA: number;
  subdivisionRequired: boolean;
};

export type HeaterBlock = {
  inletTemperatureC: number;
  outletTemperatureC: number;
  temperatureRiseK: number;
  /** m (h(T_out, p) - h(T_in, p)) on the sizing's equation of state. */
  absorbedDutyKw: number;
  /** The same duty for an ideal gas (NASA polynomials). */
  idealGasDutyKw: number;
  /** (ideal - real) / real, %; null when ideal gas was asked for. */
  idealGasDifferencePercent: number | null;
  averageCpDutyKw: number;
  averageCpDifferencePercent: number;
  cpMeanJPerKgK: number;
  heatLossPercent: number;
  heatLossKw: number;
  designMarginPercent: number;
  marginKw: number;
  designDutyKw: number;
  selectedRatingKw: number | null;
  electrical: HeaterElectrical;
  outletActualFlowM3PerH: number;
  properties: { inlet: PropertyPoint; outlet: PropertyPoint; mean: PropertyPoint };
};

export type CoolerResult = {
  kind: 'intercooler' | 'aftercooler';
  outletTemperatureC: number;
  outletPressureKpa: number;
  /** Heat removed, kW: sensible plus the latent heat of any condensate. */
  dutyKw: number;
  /** Part of the duty beyond cooling the stream as a gas to the same outlet state: the condensation, kW. */
  latentDutyKw: number;
  /** Liquid knocked out at the cooler outlet, kg/h (0 when nothing condenses). */
  condensateKgPerH: number;
  /** Mole fractions of the condensate, or null when nothing condenses. */
  condensateMoleFractions: MoleFractions | null;
};

export type CompressorStage = {
  stage: number;
  pressureRatio: number;
  inletPressureKpa: number;
  dischargePressureKpa: number;
  inletTemperatureC: number;
  dischargeTemperatureC: number;
  isentropicDischargeTemperatureC: number;
  /** Mass flow through the stage (less than the suction flow when an upstream cooler knocked out liquid). */
  massFlowKgPerS: number;
  inletZ: number;
  dischargeZ: number;
  inletDensityKgPerM3: number;
  dischargeDensityKgPerM3: number;
  inletActualFlowM3PerH: number;
  inletActualFlowAcfm: number;
  dischargeActualFlowM3PerH: number;
  /** Specific work h2 - h1. */
  specificWorkKjPerKg: number;
  /** h(p2, s1) - h1. */
  isentropicHeadKjPerKg: number;
  /** Integral of v dp along the path. */
  polytropicHeadKjPerKg: number;
  /** Heads as a height of the gas column: head / g (g = 9.80665 m/s2). */
  isentropicHeadM: number;
  polytropicHeadM: number;
  isentropicHeadFt: number;
  polytropicHeadFt: number;
  isentropicEfficiency: number;
  polytropicEfficiency: number;
  /** n of p v^n = const between the stage's end states. */
  polytropicExponent: number;
  gasPowerKw: number;
  /** k and cp used for (constant-k) or found at (variable-cp, real-gas) the stage inlet. */
  k: number;
  cpJPerKgK: number;
  /** The cooler after this stage: an intercooler, or the aftercooler after the last stage; null if none. */
  cooler: CoolerResult | null;
};

export type CompressionMethodResult = {
  /** k and cp at the first stage inlet (or the user's overrides for constant-k). */
  k: number;
  cpJPerKgK: number;
  gasPowerKw: number;
  specificWorkKjPerKg: number;
  stages: CompressorStage[];
  /** Coolers between stages only: N-1 entries. */
  intercoolerDutiesKw: number[];
  totalIntercoolerDutyKw: number;
  aftercoolerDutyKw: number | null;
  /** Liquid knocked out by all coolers, kg/h. */
  condensateKgPerH: number;
  /** Steps per stage of the integrated polytropic path (real-gas with a polytropic efficiency), else null. */
  polytropicSteps: number | null;
};

export type MotorSelection = {
  iecKw: number | null;
  nemaHp: number | null;
  requiredMarginPercent: number;
  /** Margin of the IEC rating over shaft power. */
  marginPercent: number | null;
  nemaMarginPercent: number | null;
};

export type MotorDrive = {
  motorEfficiency: number;
  powerFactor: number;
  inputPowerKw: number;
  voltageV: number;
  phases: 1 | 3;
  lineCurrentA: number;
};

export type CompressorBlock = {
  /** The method the headline figures (gas power, shaft power, motor, discharge temperatures) come from. */
  basis: 'constant-k' | 'variable-cp' | 'real-gas';
  suctionPressureKpa: number;
  dischargePressureKpa: number;
  overallPressureRatio: number;
  stageCount: number;
  stagePressureRatio: number;
  interstagePressureDropPercent: number;
  intercoolerOutletTemperatureC: number;
  isentropicEfficiency: number;
  polytropicEfficiency: number | null;
  constantK: CompressionMethodResult;
  variableCp: CompressionMethodResult;
  /** On the real-gas equation of state (basis.equationOfState); null when ideal gas was asked for. */
  realGas: CompressionMethodResult | null;
  /** (constant-k - variable-cp) / variable-cp gas power, %. */
  methodDifferencePercent: number;
  /** (variable-cp - real-gas) / real-gas gas power, %: what assuming an ideal gas would cost; null without real gas. */
  idealGasDifferencePercent: number | null;
  gasPowerKw: number;
  mechanicalEfficiency: number;
  shaftPowerKw: number;
  motor: MotorSelection;
  drive: MotorDrive | null;
  motorInputPowerKw: number | null;
  lineCurrentA: number | null;
  dischargeTemperatureLimitC: number;
  suggestedStages: number | null;
  dischargeActualFlowM3PerH: number;
};

type CommonResult = {
  engineVersion: string;
  massFlowKgPerS: number;
  molarMassKgPerKmol: number;
  inletTemperatureC: number;
  inletPressureKpa: number;
  inletZ: number;
  inletDensityKgPerM3: number;
  inletActualFlowM3PerH: number;
  flows: FlowSummary;
  gas: GasSummary;
  basis: BasisInfo;
  warnings: SizingWarning[];
};

export type HeaterResult = CommonResult & { service: 'heater'; heater: HeaterBlock };
export type CompressorResult = CommonResult & { service: 'compressor'; compressor: CompressorBlock };
export type SizingResult = HeaterResult | CompressorResult;
