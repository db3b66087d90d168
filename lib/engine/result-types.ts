import type { MoleFractions } from '../thermo/composition';

export type Severity = 'info' | 'caution' | 'warning' | 'danger';

/** A caution shown beside the figures; `code` is stable for the form and datasheets to key on. */
export type SizingWarning = { code: string; severity: Severity; message: string };

/** cp, cv (J/(kg K)) and k at one temperature. */
export type PropertyPoint = { temperatureC: number; cpJPerKgK: number; cvJPerKgK: number; k: number };

export type StandardFlowBasisInfo = { unit: string; temperatureC: number; pressureKpa: number; description: string };

/** What the figures rest on; datasheets print it. */
export type BasisInfo = {
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
  absorbedDutyKw: number;
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

export type CompressorStage = {
  stage: number;
  pressureRatio: number;
  inletPressureKpa: number;
  dischargePressureKpa: number;
  inletTemperatureC: number;
  dischargeTemperatureC: number;
  isentropicDischargeTemperatureC: number;
  specificWorkKjPerKg: number;
  gasPowerKw: number;
  /** k and cp used for (constant-k) or found at (variable-cp) the stage inlet. */
  k: number;
  cpJPerKgK: number;
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
  basis: 'constant-k' | 'variable-cp';
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
  /** (constant-k - variable-cp) / variable-cp gas power, %. */
  methodDifferencePercent: number;
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
  inletActualFlowM3PerH: number;
  flows: FlowSummary;
  gas: GasSummary;
  basis: BasisInfo;
  warnings: SizingWarning[];
};

export type HeaterResult = CommonResult & { service: 'heater'; heater: HeaterBlock };
export type CompressorResult = CommonResult & { service: 'compressor'; compressor: CompressorBlock };
export type SizingResult = HeaterResult | CompressorResult;
