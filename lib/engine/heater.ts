import { ZERO_CELSIUS_K } from '../thermo/constants';
import type { GasModel } from '../thermo/gas-model';
import { cpMass as cpMassImported, enthalpyMass as enthalpyMassImported } from '../thermo/properties';
import {
  SUBDIVISION_LIMIT_A,
  continuousCurrentA as continuousCurrentAImported,
  lineCurrentA as lineCurrentAImported,
} from './electrical';
import { propertyPoint as propertyPointImported, realPoint } from './property-point';
import { gasState, type RealFluid } from './real-gas/fluid';
import { selectRating as selectRatingImported } from './ratings';
import type { HeaterBlock } from './result-types';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const cpMass = cpMassImported;
const enthalpyMass = enthalpyMassImported;
const continuousCurrentA = continuousCurrentAImported;
const lineCurrentA = lineCurrentAImported;
const propertyPoint = propertyPointImported;
const selectRating = selectRatingImported;
const KELVIN_OFFSET = ZERO_CELSIUS_K;
const SUBDIVIDE_ABOVE_A = SUBDIVISION_LIMIT_A;

/** A heater duty point in SI units, as `calculateCore` resolves it. */
export type HeaterCase = {
  gas: GasModel;
  /** The real-gas equation the duty is figured on; null for an ideal gas. */
  fluid?: RealFluid | null;
  massFlowKgPerS: number;
  inletTemperatureK: number;
  outletTemperatureK: number;
  pressurePa: number;
  heatLossPercent: number;
  designMarginPercent: number;
  voltageV: number;
  phases: 1 | 3;
  ratingsKw: readonly number[];
};

/**
 * Design duty convention: loss = absorbed x loss %; margin = (absorbed + loss) x margin %;
 * design = absorbed + loss + margin = absorbed (1 + loss %)(1 + margin %).
 */
export const DESIGN_DUTY_CONVENTION =
  'design duty = absorbed duty x (1 + heat loss %) x (1 + design margin %); heat loss is taken on the absorbed duty, margin on absorbed + loss';

/** Absorbed duty, kW: the enthalpy integral m (h(T_out) - h(T_in)). */
export function absorbedDutyKw(gas: GasModel, massFlowKgPerS: number, inletK: number, outletK: number): number {
  return (massFlowKgPerS * (enthalpyMass(gas, outletK) - enthalpyMass(gas, inletK))) / 1000;
}

/** The average-cp hand estimate, kW: m cp(T_mean) (T_out - T_in). */
export function averageCpDutyKw(gas: GasModel, massFlowKgPerS: number, inletK: number, outletK: number): number {
  return (massFlowKgPerS * cpMass(gas, 0.5 * (inletK + outletK)) * (outletK - inletK)) / 1000;
}

/** Sizes an electric process gas heater for one duty point. */
export function sizeHeater(c: HeaterCase): HeaterBlock {
  const { gas, massFlowKgPerS: m, inletTemperatureK: t1, outletTemperatureK: t2 } = c;
  const meanK = 0.5 * (t1 + t2);
  const ideal = absorbedDutyKw(gas, m, t1, t2);
  let absorbed = ideal;
  let points: HeaterBlock['properties'];
  let outletDensity: number;
  if (c.fluid) {
    // Real gas: the enthalpy change at the operating pressure, h(T_out, p) - h(T_in, p).
    const a = gasState(c.fluid, t1, c.pressurePa);
    const b = gasState(c.fluid, t2, c.pressurePa);
    const mid = gasState(c.fluid, meanK, c.pressurePa);
    absorbed = (m * (b.enthalpyJPerMol - a.enthalpyJPerMol)) / c.fluid.kgPerMol / 1000;
    points = { inlet: realPoint(c.fluid, a), outlet: realPoint(c.fluid, b), mean: realPoint(c.fluid, mid) };
    outletDensity = points.outlet.densityKgPerM3;
  } else {
    points = {
      inlet: propertyPoint(gas, t1, c.pressurePa),
      outlet: propertyPoint(gas, t2, c.pressurePa),
      mean: propertyPoint(gas, meanK, c.pressurePa),
    };
    outletDensity = c.pressurePa / (gas.gasConstantJPerKgK * t2);
  }
  const cpMean = points.mean.cpJPerKgK;
  const averageCp = (m * cpMean * (t2 - t1)) / 1000;
  const heatLossKw = (absorbed * c.heatLossPercent) / 100;
  const marginKw = ((absorbed + heatLossKw) * c.designMarginPercent) / 100;
  const designDutyKw = absorbed + heatLossKw + marginKw;
  const selectedRatingKw = selectRating(designDutyKw, c.ratingsKw);
  const powerBasisKw = selectedRatingKw ?? designDutyKw;
  const currentA = lineCurrentA(powerBasisKw, c.voltageV, c.phases);
  return {
    inletTemperatureC: t1 - KELVIN_OFFSET,
    outletTemperatureC: t2 - KELVIN_OFFSET,
    temperatureRiseK: t2 - t1,
    absorbedDutyKw: absorbed,
    idealGasDutyKw: ideal,
    idealGasDifferencePercent: c.fluid ? ((ideal - absorbed) / absorbed) * 100 : null,
    averageCpDutyKw: averageCp,
    averageCpDifferencePercent: ((averageCp - absorbed) / absorbed) * 100,
    cpMeanJPerKgK: cpMean,
    heatLossPercent: c.heatLossPercent,
    heatLossKw,
    designMarginPercent: c.designMarginPercent,
    marginKw,
    designDutyKw,
    selectedRatingKw,
    electrical: {
      voltageV: c.voltageV,
      phases: c.phases,
      powerBasisKw,
      powerBasis: selectedRatingKw === null ? 'design-duty' : 'selected-rating',
      currentA,
      continuousCurrentA: continuousCurrentA(currentA),
      subdivisionRequired: currentA > SUBDIVIDE_ABOVE_A,
    },
    outletActualFlowM3PerH: (3600 * m) / outletDensity,
    properties: points,
  };
}
