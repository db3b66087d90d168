import { ZERO_CELSIUS_K } from '../thermo/constants';
import type { GasModel } from '../thermo/gas-model';
import { enthalpyMass as enthalpyMassImported } from '../thermo/properties';
import {
  constantKProperties as constantKPropertiesImported,
  constantKStage as constantKStageImported,
  newStageState,
  stagePressureRatio as stagePressureRatioImported,
  variableCpStage as variableCpStageImported,
  type StageState,
} from './compression';
import type { CompressionMethodResult, CompressorStage, CoolerResult } from './result-types';
import { idealPolytropic, stageRow } from './stage-row';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const enthalpyMass = enthalpyMassImported;
const constantKProperties = constantKPropertiesImported;
const constantKStage = constantKStageImported;
const stagePressureRatio = stagePressureRatioImported;
const variableCpStage = variableCpStageImported;
const KELVIN_OFFSET = ZERO_CELSIUS_K;

export type Method = 'constant-k' | 'variable-cp';

/** The parts of a compressor duty a train calculation needs, SI units. */
export type TrainCase = {
  gas: GasModel;
  massFlowKgPerS: number;
  suctionTemperatureK: number;
  suctionPressurePa: number;
  dischargePressurePa: number;
  interstageDropFraction: number;
  intercoolerOutletTemperatureK: number;
  aftercoolerOutletTemperatureK: number | null;
  kOverride: number | null;
  cpOverride: number | null;
};

const scratch = newStageState();

function runStage(c: TrainCase, method: Method, inletK: number, ratio: number, eta: number, out: StageState): void {
  if (method === 'variable-cp') {
    variableCpStage(c.gas, inletK, ratio, eta, out);
  } else {
    constantKProperties(c.gas, inletK, c.kOverride, c.cpOverride, out);
    constantKStage(inletK, ratio, eta, out);
  }
}

// A cooler cannot heat: when the requested outlet is above the gas temperature nothing is removed.
function cooledK(c: TrainCase, dischargeK: number): number {
  return Math.min(c.intercoolerOutletTemperatureK, dischargeK);
}

/**
 * Highest stage discharge temperature, K, for N stages; allocation-free (used by the stage-count search).
 * With equal ratios, stages 2..N all start at the intercooler outlet once it cools at all, so they are
 * identical and two stage evaluations suffice.
 */
export function maxDischargeK(c: TrainCase, method: Method, stages: number, eta: number): number {
  const ratio = stagePressureRatio(stages, c.suctionPressurePa, c.dischargePressurePa, c.interstageDropFraction);
  runStage(c, method, c.suctionTemperatureK, ratio, eta, scratch);
  let max = scratch.dischargeK;
  let inletK = cooledK(c, scratch.dischargeK);
  for (let i = 1; i < stages; i++) {
    runStage(c, method, inletK, ratio, eta, scratch);
    if (scratch.dischargeK > max) max = scratch.dischargeK;
    const nextK = cooledK(c, scratch.dischargeK);
    if (nextK === inletK) break; // every later stage repeats this one
    inletK = nextK;
  }
  return max;
}

function coolerDutyKw(c: TrainCase, method: Method, fromK: number, toK: number, cpJPerKgK: number): number {
  if (!(fromK > toK)) return 0;
  // Constant-k keeps the stage's cp for its cooler, variable-cp integrates h.
  const dh =
    method === 'variable-cp' ? enthalpyMass(c.gas, fromK) - enthalpyMass(c.gas, toK) : cpJPerKgK * (fromK - toK);
  return (c.massFlowKgPerS * dh) / 1000;
}

/** Full stage-by-stage result for one method. */
export function runTrain(c: TrainCase, method: Method, stages: number, eta: number): CompressionMethodResult {
  const ratio = stagePressureRatio(stages, c.suctionPressurePa, c.dischargePressurePa, c.interstageDropFraction);
  const out: CompressorStage[] = [];
  const intercoolerDutiesKw: number[] = [];
  let inletK = c.suctionTemperatureK;
  let inletPa = c.suctionPressurePa;
  let workJPerKg = 0;
  let coolerTotal = 0;
  let aftercoolerDutyKw: number | null = null;
  const s = newStageState();
  let computedForK = NaN;
  for (let i = 0; i < stages; i++) {
    // Stages that start at the same temperature (same ratio and efficiency) give the same result.
    if (inletK !== computedForK) {
      runStage(c, method, inletK, ratio, eta, s);
      computedForK = inletK;
    }
    const dischargePa = i === stages - 1 ? c.dischargePressurePa : inletPa * ratio;
    workJPerKg += s.workJPerKg;
    let cooler: CoolerResult | null = null;
    let nextK = inletK;
    if (i < stages - 1) {
      nextK = cooledK(c, s.dischargeK);
      const duty = coolerDutyKw(c, method, s.dischargeK, nextK, s.cpJPerKgK);
      intercoolerDutiesKw.push(duty);
      coolerTotal += duty;
      cooler = dryCooler('intercooler', nextK, dischargePa * (1 - c.interstageDropFraction), duty);
    } else if (c.aftercoolerOutletTemperatureK !== null) {
      const outK = Math.min(c.aftercoolerOutletTemperatureK, s.dischargeK);
      aftercoolerDutyKw = coolerDutyKw(c, method, s.dischargeK, outK, s.cpJPerKgK);
      cooler = dryCooler('aftercooler', outK, dischargePa, aftercoolerDutyKw);
    }
    out.push(idealStageRow(c, method, i + 1, ratio, inletK, inletPa, dischargePa, s, cooler));
    inletK = nextK;
    inletPa = dischargePa * (1 - c.interstageDropFraction);
  }
  const first = out[0]!;
  return {
    k: first.k,
    cpJPerKgK: first.cpJPerKgK,
    gasPowerKw: (c.massFlowKgPerS * workJPerKg) / 1000,
    specificWorkKjPerKg: workJPerKg / 1000,
    stages: out,
    intercoolerDutiesKw,
    totalIntercoolerDutyKw: coolerTotal,
    aftercoolerDutyKw,
    condensateKgPerH: 0,
    polytropicSteps: null,
  };
}

function dryCooler(kind: CoolerResult['kind'], outletK: number, outletPa: number, dutyKw: number): CoolerResult {
  return {
    kind,
    outletTemperatureC: outletK - KELVIN_OFFSET,
    outletPressureKpa: outletPa / 1000,
    dutyKw,
    latentDutyKw: 0,
    condensateKgPerH: 0,
    condensateMoleFractions: null,
  };
}

// An ideal-gas stage row: Z = 1, rho = p/(R T); isentropic head on the method's own property model.
function idealStageRow(
  c: TrainCase,
  method: Method,
  stage: number,
  ratio: number,
  inletK: number,
  inletPa: number,
  dischargePa: number,
  s: StageState,
  cooler: CoolerResult | null,
): CompressorStage {
  const r = c.gas.gasConstantJPerKgK;
  const isentropicHead =
    method === 'variable-cp'
      ? enthalpyMass(c.gas, s.isentropicDischargeK) - enthalpyMass(c.gas, inletK)
      : s.cpJPerKgK * (s.isentropicDischargeK - inletK);
  const poly = idealPolytropic(r, inletK, s.dischargeK, dischargePa / inletPa);
  return stageRow({
    stage,
    pressureRatio: ratio,
    inletPa,
    dischargePa,
    inletK,
    dischargeK: s.dischargeK,
    isentropicDischargeK: s.isentropicDischargeK,
    massFlowKgPerS: c.massFlowKgPerS,
    inletZ: 1,
    dischargeZ: 1,
    inletDensityKgPerM3: inletPa / (r * inletK),
    dischargeDensityKgPerM3: dischargePa / (r * s.dischargeK),
    workJPerKg: s.workJPerKg,
    isentropicHeadJPerKg: isentropicHead,
    polytropicHeadJPerKg: poly.headJPerKg,
    polytropicExponent: poly.n,
    k: s.k,
    cpJPerKgK: s.cpJPerKgK,
    cooler,
  });
}
