import { ZERO_CELSIUS_K } from '../thermo/constants';
import type { GasModel } from '../thermo/gas-model';
import { cpMass as cpMassImported } from '../thermo/properties';
import type { FluidState } from '../thermo/eos/state';
import type { RealFluid } from './real-gas/fluid';
import type { PropertyPoint } from './result-types';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const cpMass = cpMassImported;
const KELVIN_OFFSET = ZERO_CELSIUS_K;

/** Ideal-gas cp, cv and k at one temperature (Z = 1) for the result's property summaries. */
export function propertyPoint(gas: GasModel, temperatureK: number, pressurePa: number): PropertyPoint {
  const cp = cpMass(gas, temperatureK);
  const cv = cp - gas.gasConstantJPerKgK;
  return {
    temperatureC: temperatureK - KELVIN_OFFSET,
    cpJPerKgK: cp,
    cvJPerKgK: cv,
    k: cp / cv,
    z: 1,
    isentropicExponent: cp / cv,
    densityKgPerM3: pressurePa / (gas.gasConstantJPerKgK * temperatureK),
  };
}

/** The same summary from a real-gas state (molar state converted to the mass basis). */
export function realPoint(fluid: RealFluid, s: FluidState): PropertyPoint {
  const m = fluid.kgPerMol;
  return {
    temperatureC: s.temperatureK - KELVIN_OFFSET,
    cpJPerKgK: s.cpJPerMolK / m,
    cvJPerKgK: s.cvJPerMolK / m,
    k: s.cpJPerMolK / s.cvJPerMolK,
    z: s.z,
    isentropicExponent: s.isentropicExponent,
    densityKgPerM3: s.densityMolPerM3 * m,
  };
}
