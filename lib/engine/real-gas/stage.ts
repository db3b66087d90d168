import { compressPolytropic } from '../../thermo/eos/polytropic-path';
import { newFluidState, type FluidState } from '../../thermo/eos/state';
import { isentropicState, stateAtEnthalpy, type RealFluid } from './fluid';

/** One adiabatic stage on real-gas properties, molar states and mass-basis figures. */
export type RealStage = {
  suction: FluidState;
  discharge: FluidState;
  isentropicDischarge: FluidState;
  /** h2 - h1, J/kg. */
  workJPerKg: number;
  /** h(p2, s1) - h1, J/kg. */
  isentropicHeadJPerKg: number;
  /** Integral of v dp along the compression path, J/kg. */
  polytropicHeadJPerKg: number;
  /** n of p v^n = const between suction and discharge. */
  polytropicExponent: number;
  isentropicEfficiency: number;
  polytropicEfficiency: number;
  /** Integration steps of the polytropic path, or null when the stage was given an isentropic efficiency. */
  polytropicSteps: number | null;
};

const ln = Math.log;

/**
 * Polytropic head of a stage known by its end states, by Schultz's method: the polytropic exponent from the
 * end volumes and a correction factor f from the isentropic path
 * [pub: J. M. Schultz, "The polytropic analysis of centrifugal compressors", J. Eng. Power 84 (1962) 69-82;
 * ASME PTC 10-1997, section 5]:
 *   n = ln(p2/p1)/ln(v1/v2),  f = (h2s - h1) / [ns/(ns-1) (p2 v2s - p1 v1)],  Hp = f n/(n-1) (p2 v2 - p1 v1).
 */
function schultzHead(s1: FluidState, s2: FluidState, s2s: FluidState): { headJPerMol: number; n: number } {
  const r = s2.pressurePa / s1.pressurePa;
  const pv1 = s1.pressurePa / s1.densityMolPerM3;
  const pv2 = s2.pressurePa / s2.densityMolPerM3;
  const pv2s = s2s.pressurePa / s2s.densityMolPerM3;
  const ns = ln(r) / ln(s2s.densityMolPerM3 / s1.densityMolPerM3);
  const n = ln(r) / ln(s2.densityMolPerM3 / s1.densityMolPerM3);
  const f = (s2s.enthalpyJPerMol - s1.enthalpyJPerMol) / ((ns / (ns - 1)) * (pv2s - pv1));
  return { headJPerMol: f * (n / (n - 1)) * (pv2 - pv1), n };
}

/**
 * Compresses `suction` to p2. With an isentropic efficiency: h2 = h1 + (h(p2, s1) - h1)/eta_s and the
 * polytropic figures by Schultz's method. With a polytropic efficiency: the path dh = v dp/eta_p integrated in
 * small steps (lib/thermo/eos/polytropic-path.ts) and eta_s = (h(p2, s1) - h1)/(h2 - h1).
 */
export function realStage(
  fluid: RealFluid,
  suction: FluidState,
  dischargePressurePa: number,
  isentropicEfficiency: number | null,
  polytropicEfficiency: number | null,
): RealStage {
  const m = fluid.kgPerMol;
  const s2s = isentropicState(fluid, suction, dischargePressurePa, newFluidState());
  const dhs = s2s.enthalpyJPerMol - suction.enthalpyJPerMol;
  if (isentropicEfficiency !== null) {
    const h2 = suction.enthalpyJPerMol + dhs / isentropicEfficiency;
    const guessK = suction.temperatureK + (s2s.temperatureK - suction.temperatureK) / isentropicEfficiency;
    const s2 = stateAtEnthalpy(fluid, dischargePressurePa, h2, guessK, newFluidState());
    const dh = s2.enthalpyJPerMol - suction.enthalpyJPerMol;
    const schultz = schultzHead(suction, s2, s2s);
    return {
      suction,
      discharge: s2,
      isentropicDischarge: s2s,
      workJPerKg: dh / m,
      isentropicHeadJPerKg: dhs / m,
      polytropicHeadJPerKg: schultz.headJPerMol / m,
      polytropicExponent: schultz.n,
      isentropicEfficiency,
      polytropicEfficiency: schultz.headJPerMol / dh,
      polytropicSteps: null,
    };
  }
  const eta = polytropicEfficiency ?? 1;
  const path = compressPolytropic(fluid.eos, suction, dischargePressurePa, eta);
  const dh = path.end.enthalpyJPerMol - suction.enthalpyJPerMol;
  return {
    suction,
    discharge: path.end,
    isentropicDischarge: s2s,
    workJPerKg: dh / m,
    isentropicHeadJPerKg: dhs / m,
    polytropicHeadJPerKg: path.polytropicHeadJPerMol / m,
    polytropicExponent: path.polytropicExponent,
    isentropicEfficiency: dhs / dh,
    polytropicEfficiency: eta,
    polytropicSteps: path.steps,
  };
}
