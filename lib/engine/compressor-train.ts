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
import {
  CoolerFloodedError,
  MIN_VAPOUR_FRACTION,
  condensateLiquids,
  coolerSplit,
  liquidState,
  vapourGas,
} from './real-gas/condensation';
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

/** What a cooler on ideal-gas properties does to the stream: duty, condensate and what goes on. */
type IdealCooled = { cooler: CoolerResult; next: TrainCase };

// Sensible duty on the method's own property model; when the outlet is below the dew point (Peng-Robinson
// stability test and flash) the condensate's latent heat is added: its ideal-gas enthalpy minus its liquid
// enthalpy from Peng-Robinson, and the vapour alone goes on to the next stage.
function idealCooler(
  c: TrainCase,
  method: Method,
  stage: number,
  kind: CoolerResult['kind'],
  fromK: number,
  toK: number,
  outletPa: number,
  cpJPerKgK: number,
): IdealCooled {
  const sensible = coolerDutyKw(c, method, fromK, toK, cpJPerKgK);
  const split = toK < fromK ? coolerSplit(c.gas, toK, outletPa) : null;
  if (!split) return { cooler: dryCooler(kind, toK, outletPa, sensible), next: c };
  const total = split.vapourFraction <= MIN_VAPOUR_FRACTION;
  if (total && kind === 'intercooler') throw new CoolerFloodedError(stage, toK, outletPa);
  const molPerS = c.massFlowKgPerS / (c.gas.molarMassKgPerKmol / 1000);
  const liquidMolPerS = molPerS * (1 - split.vapourFraction);
  let latentPerMol = 0;
  let liquidKgPerMol = 0;
  for (const liquid of condensateLiquids(split)) {
    const { fluid, state } = liquidState(liquid.gas, 'peng-robinson', toK, outletPa);
    latentPerMol -= liquid.share * state.enthalpyDepartureJPerMol;
    liquidKgPerMol += liquid.share * fluid.kgPerMol;
  }
  const vapour = total ? c.gas : vapourGas(split);
  const latentKw = (liquidMolPerS * latentPerMol) / 1000;
  const cooler: CoolerResult = {
    ...dryCooler(kind, toK, outletPa, sensible + latentKw),
    latentDutyKw: latentKw,
    condensateKgPerH: liquidMolPerS * liquidKgPerMol * 3600,
    condensateMoleFractions: split.condensate as CoolerResult['condensateMoleFractions'],
  };
  const vapourKgPerS = molPerS * split.vapourFraction * (vapour.molarMassKgPerKmol / 1000);
  return { cooler, next: { ...c, gas: vapour, massFlowKgPerS: vapourKgPerS } };
}

/** Full stage-by-stage result for one method. */
export function runTrain(suction: TrainCase, method: Method, stages: number, eta: number): CompressionMethodResult {
  const ratio = stagePressureRatio(
    stages,
    suction.suctionPressurePa,
    suction.dischargePressurePa,
    suction.interstageDropFraction,
  );
  let c = suction;
  const out: CompressorStage[] = [];
  const intercoolerDutiesKw: number[] = [];
  let inletK = c.suctionTemperatureK;
  let inletPa = c.suctionPressurePa;
  let gasPowerKw = 0;
  let coolerTotal = 0;
  let condensateKgPerH = 0;
  let aftercoolerDutyKw: number | null = null;
  const s = newStageState();
  let computedForK = NaN;
  for (let i = 0; i < stages; i++) {
    // Stages that start at the same temperature (same gas, ratio and efficiency) give the same result.
    if (inletK !== computedForK) {
      runStage(c, method, inletK, ratio, eta, s);
      computedForK = inletK;
    }
    const dischargePa = i === stages - 1 ? c.dischargePressurePa : inletPa * ratio;
    gasPowerKw += (c.massFlowKgPerS * s.workJPerKg) / 1000;
    let cooled: IdealCooled | null = null;
    let nextK = inletK;
    if (i < stages - 1) {
      nextK = cooledK(c, s.dischargeK);
      const outPa = dischargePa * (1 - c.interstageDropFraction);
      cooled = idealCooler(c, method, i + 1, 'intercooler', s.dischargeK, nextK, outPa, s.cpJPerKgK);
      intercoolerDutiesKw.push(cooled.cooler.dutyKw);
      coolerTotal += cooled.cooler.dutyKw;
    } else if (c.aftercoolerOutletTemperatureK !== null) {
      const outK = Math.min(c.aftercoolerOutletTemperatureK, s.dischargeK);
      cooled = idealCooler(c, method, i + 1, 'aftercooler', s.dischargeK, outK, dischargePa, s.cpJPerKgK);
      aftercoolerDutyKw = cooled.cooler.dutyKw;
    }
    out.push(idealStageRow(c, method, i + 1, ratio, inletK, inletPa, dischargePa, s, cooled?.cooler ?? null));
    if (cooled) {
      condensateKgPerH += cooled.cooler.condensateKgPerH;
      if (cooled.next !== c) {
        c = cooled.next;
        computedForK = NaN;
      }
    }
    inletK = nextK;
    inletPa = dischargePa * (1 - c.interstageDropFraction);
  }
  const first = out[0]!;
  return {
    k: first.k,
    cpJPerKgK: first.cpJPerKgK,
    gasPowerKw,
    specificWorkKjPerKg: gasPowerKw / suction.massFlowKgPerS,
    stages: out,
    intercoolerDutiesKw,
    totalIntercoolerDutyKw: coolerTotal,
    aftercoolerDutyKw,
    condensateKgPerH,
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
