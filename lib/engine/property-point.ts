import { ZERO_CELSIUS_K } from '../thermo/constants';
import type { GasModel } from '../thermo/gas-model';
import { cpMass as cpMassImported } from '../thermo/properties';
import type { PropertyPoint } from './result-types';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const cpMass = cpMassImported;
const KELVIN_OFFSET = ZERO_CELSIUS_K;

/** cp, cv and k at one temperature for the result's property summaries. */
export function propertyPoint(gas: GasModel, temperatureK: number, cp = cpMass(gas, temperatureK)): PropertyPoint {
  const cv = cp - gas.gasConstantJPerKgK;
  return { temperatureC: temperatureK - KELVIN_OFFSET, cpJPerKgK: cp, cvJPerKgK: cv, k: cp / cv };
}
