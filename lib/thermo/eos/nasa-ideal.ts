import type { GasModel } from '../gas-model';
import { cpMass, enthalpyMass, standardEntropyMass } from '../properties';
import type { IdealGasModel } from './types';

/**
 * The engine's NASA-polynomial ideal gas on the molar basis an equation of state works in. The
 * polynomials' s° is at 1 bar, the p0 the property layer uses.
 */
export function nasaIdealGas(gas: GasModel): IdealGasModel {
  const m = gas.molarMassKgPerKmol / 1000;
  return {
    cp0: (t) => cpMass(gas, t) * m,
    h0: (t) => enthalpyMass(gas, t) * m,
    s0: (t) => standardEntropyMass(gas, t) * m,
  };
}
