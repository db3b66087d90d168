import type { FluidState } from '../../thermo/eos/state';
import { stagePressureRatio } from '../compression';
import type { TrainCase } from '../compressor-train';
import type { CompressionMethodResult, CompressorStage, CoolerResult } from '../result-types';
import { stageRow } from '../stage-row';
import { coolGas } from './cooler';
import { gasState, type RealFluid } from './fluid';
import { realStage, type RealStage } from './stage';

/** The efficiency a stage is given: exactly one of the two is set. */
export type StageEfficiency = { isentropic: number | null; polytropic: number | null };

function massState(fluid: RealFluid, s: FluidState): { densityKgPerM3: number; cpJPerKgK: number } {
  return { densityKgPerM3: s.densityMolPerM3 * fluid.kgPerMol, cpJPerKgK: s.cpJPerMolK / fluid.kgPerMol };
}

/**
 * Highest stage discharge temperature (K) on real-gas properties for N stages with equal ratios; used by the
 * stage-count search, so it skips the coolers' condensation (it changes the flow, hardly the temperatures).
 */
export function realMaxDischargeK(c: TrainCase, fluid: RealFluid, stages: number, eff: StageEfficiency): number {
  const ratio = stagePressureRatio(stages, c.suctionPressurePa, c.dischargePressurePa, c.interstageDropFraction);
  let inletK = c.suctionTemperatureK;
  let inletPa = c.suctionPressurePa;
  let max = 0;
  for (let i = 0; i < stages; i++) {
    const dischargePa = i === stages - 1 ? c.dischargePressurePa : inletPa * ratio;
    const st = realStage(fluid, gasState(fluid, inletK, inletPa), dischargePa, eff.isentropic, eff.polytropic);
    const t2 = st.discharge.temperatureK;
    if (t2 > max) max = t2;
    inletK = Math.min(c.intercoolerOutletTemperatureK, t2);
    inletPa = dischargePa * (1 - c.interstageDropFraction);
  }
  return max;
}

function row(fluid: RealFluid, i: number, ratio: number, massFlow: number, st: RealStage, cooler: CoolerResult | null) {
  const a = massState(fluid, st.suction);
  const b = massState(fluid, st.discharge);
  return stageRow({
    stage: i + 1,
    pressureRatio: ratio,
    inletPa: st.suction.pressurePa,
    dischargePa: st.discharge.pressurePa,
    inletK: st.suction.temperatureK,
    dischargeK: st.discharge.temperatureK,
    isentropicDischargeK: st.isentropicDischarge.temperatureK,
    massFlowKgPerS: massFlow,
    inletZ: st.suction.z,
    dischargeZ: st.discharge.z,
    inletDensityKgPerM3: a.densityKgPerM3,
    dischargeDensityKgPerM3: b.densityKgPerM3,
    workJPerKg: st.workJPerKg,
    isentropicHeadJPerKg: st.isentropicHeadJPerKg,
    polytropicHeadJPerKg: st.polytropicHeadJPerKg,
    polytropicExponent: st.polytropicExponent,
    k: st.suction.cpJPerMolK / st.suction.cvJPerMolK,
    cpJPerKgK: a.cpJPerKgK,
    cooler,
  });
}

/**
 * A multistage train on real-gas properties: each stage from its suction state (T, p) on the gas branch;
 * coolers take the gas to the intercooler outlet temperature at the pressure after the interstage drop,
 * knocking out any condensate, whose latent heat is part of the cooler duty; the next stage takes the
 * vapour only.
 */
export function runRealGasTrain(
  c: TrainCase,
  first: RealFluid,
  stages: number,
  eff: StageEfficiency,
): CompressionMethodResult {
  const ratio = stagePressureRatio(stages, c.suctionPressurePa, c.dischargePressurePa, c.interstageDropFraction);
  const out: CompressorStage[] = [];
  const intercoolerDutiesKw: number[] = [];
  let fluid = first;
  let massFlow = c.massFlowKgPerS;
  let inletK = c.suctionTemperatureK;
  let inletPa = c.suctionPressurePa;
  let gasPowerKw = 0;
  let coolerTotal = 0;
  let aftercoolerDutyKw: number | null = null;
  let condensate = 0;
  let steps: number | null = null;
  for (let i = 0; i < stages; i++) {
    const dischargePa = i === stages - 1 ? c.dischargePressurePa : inletPa * ratio;
    const st = realStage(fluid, gasState(fluid, inletK, inletPa), dischargePa, eff.isentropic, eff.polytropic);
    steps = st.polytropicSteps;
    gasPowerKw += (massFlow * st.workJPerKg) / 1000;
    const last = i === stages - 1;
    const target = last ? c.aftercoolerOutletTemperatureK : c.intercoolerOutletTemperatureK;
    let cooler: CoolerResult | null = null;
    let next = null;
    if (target !== null) {
      const outPa = last ? dischargePa : dischargePa * (1 - c.interstageDropFraction);
      const outK = Math.min(target, st.discharge.temperatureK);
      next = coolGas(fluid, st.discharge, outK, outPa, massFlow, i + 1, last);
      cooler = { ...next.cooler, kind: last ? 'aftercooler' : 'intercooler' };
      condensate += next.cooler.condensateKgPerH;
      if (last) aftercoolerDutyKw = next.cooler.dutyKw;
      else {
        intercoolerDutiesKw.push(next.cooler.dutyKw);
        coolerTotal += next.cooler.dutyKw;
      }
    }
    out.push(row(fluid, i, ratio, massFlow, st, cooler));
    if (!last && next) {
      inletK = next.outletK;
      inletPa = next.outletPa;
      fluid = next.vapour;
      massFlow = next.vapourMassFlowKgPerS;
    }
  }
  const firstRow = out[0]!;
  return {
    k: firstRow.k,
    cpJPerKgK: firstRow.cpJPerKgK,
    gasPowerKw,
    specificWorkKjPerKg: gasPowerKw / c.massFlowKgPerS,
    stages: out,
    intercoolerDutiesKw,
    totalIntercoolerDutyKw: coolerTotal,
    aftercoolerDutyKw,
    condensateKgPerH: condensate,
    polytropicSteps: steps,
  };
}
