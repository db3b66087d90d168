import { CRITICAL_CONSTANTS } from '../thermo/critical-constants';
import type { GasModel } from '../thermo/gas-model';
import { SPECIES_IDS } from '../thermo/species-data';

export type GasState = { label: string; temperatureK: number; pressurePa: number };
export type PseudoCritical = { tcK: number; pcPa: number; omega: number };

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
