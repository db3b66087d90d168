import { CRITICAL_CONSTANTS } from '../thermo/critical-constants';
import type { GasModel } from '../thermo/gas-model';
import { SPECIES_IDS } from '../thermo/species-data';
import { saturationPressureForCheckPa } from '../thermo/water-saturation';
import type { SizingWarning } from './result-types';

export type GasState = { label: string; temperatureK: number; pressurePa: number };
export type PseudoCritical = { tcK: number; pcPa: number; omega: number };

/** Z departures that trigger a caution and a warning [cp]. */
const CAUTION_DEPARTURE = 0.02;
const WARNING_DEPARTURE = 0.05;

const cache = new WeakMap<GasModel, PseudoCritical>();

/** Mixture pseudo-critical constants by Kay's rule (mole-fraction averages) [pub: Kay, Ind. Eng. Chem. 28 (1936)]. */
export function pseudoCritical(gas: GasModel): PseudoCritical {
  const hit = cache.get(gas);
  if (hit) return hit;
  let tcK = 0;
  let pcBar = 0;
  let omega = 0;
  for (const id of SPECIES_IDS) {
    const x = gas.moleFractions[id];
    if (x === undefined) continue;
    const c = CRITICAL_CONSTANTS[id];
    tcK += x * c.tcK;
    pcBar += x * c.pcBar;
    omega += x * c.omega;
  }
  const result = Object.freeze({ tcK, pcPa: pcBar * 1e5, omega });
  cache.set(gas, result);
  return result;
}

/**
 * Compressibility from the truncated virial equation with the Pitzer-Abbott correlation,
 * Z = 1 + (B0 + w B1) Pr/Tr, B0 = 0.083 - 0.422/Tr^1.6, B1 = 0.139 - 0.172/Tr^4.2
 * [mem: Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics]. A screening
 * estimate only: it tells whether ideal gas is good enough, not what Z is at high reduced pressure.
 */
export function compressibilityEstimate(pc: PseudoCritical, temperatureK: number, pressurePa: number): number {
  const tr = temperatureK / pc.tcK;
  const pr = pressurePa / pc.pcPa;
  const lnTr = Math.log(tr);
  const b0 = 0.083 - 0.422 * Math.exp(-1.6 * lnTr);
  const b1 = 0.139 - 0.172 * Math.exp(-4.2 * lnTr);
  return 1 + ((b0 + pc.omega * b1) * pr) / tr;
}

/** A caution when any state's estimated Z departs from 1 by more than 2 % (warning above 5 %). */
export function idealGasWarning(gas: GasModel, states: readonly GasState[]): SizingWarning | null {
  const pc = pseudoCritical(gas);
  let worst: { state: GasState; z: number } | null = null;
  for (const state of states) {
    const z = compressibilityEstimate(pc, state.temperatureK, state.pressurePa);
    if (!worst || Math.abs(z - 1) > Math.abs(worst.z - 1)) worst = { state, z };
  }
  if (!worst || Math.abs(worst.z - 1) <= CAUTION_DEPARTURE) return null;
  const { state, z } = worst;
  const tr = state.temperatureK / pc.tcK;
  const pr = state.pressurePa / pc.pcPa;
  return {
    code: 'ideal-gas-doubtful',
    severity: Math.abs(z - 1) > WARNING_DEPARTURE || !(z > 0) ? 'warning' : 'caution',
    message:
      `Ideal gas is doubtful at the ${state.label} (Tr ${tr.toFixed(2)}, Pr ${pr.toFixed(2)} from Kay's-rule ` +
      `pseudo-critical constants; estimated Z ≈ ${Math.max(z, 0).toFixed(3)}). The figures assume Z = 1: confirm ` +
      'with a real-gas equation of state (ASME PTC 10 sets limits of departure from ideal-gas behaviour).',
  };
}

/** A warning when water vapour's partial pressure reaches saturation at any state (liquid forms). */
export function condensationWarning(gas: GasModel, states: readonly GasState[]): SizingWarning | null {
  const xw = gas.moleFractions.H2O;
  if (xw === undefined) return null;
  for (const state of states) {
    const partialPa = xw * state.pressurePa;
    if (partialPa >= saturationPressureForCheckPa(state.temperatureK)) {
      return {
        code: 'condensation',
        severity: 'warning',
        message:
          `Water condenses at the ${state.label}: the vapour partial pressure (${(partialPa / 1000).toFixed(1)} kPa) ` +
          'reaches saturation. Liquid is not modelled: the figures there are not valid; drain condensate and ' +
          'size on the actual vapour content.',
      };
    }
  }
  return null;
}
