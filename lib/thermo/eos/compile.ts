import type { GasModel } from '../gas-model';
import { EosError } from './eos-error';
import { compileGerg2008, type GergMoleFractions } from './gerg2008';
import type { EquationOfState } from './types';

/** Compiles a gas for a real-gas equation of state. */
export function compileEquation(id: 'peng-robinson' | 'gerg-2008', gas: GasModel): EquationOfState {
  if (id === 'gerg-2008') return compileGerg2008(gas.moleFractions as GergMoleFractions);
  throw new EosError(`${id} is not available yet for ${gas.label}`);
}
