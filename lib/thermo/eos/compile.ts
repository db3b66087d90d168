import type { GasModel } from '../gas-model';
import { compileGerg2008, type GergMoleFractions } from './gerg2008';
import { compilePengRobinson, idealGasFromGasModel } from './peng-robinson';
import type { EquationOfState } from './types';

/**
 * Compiles a gas for a real-gas equation of state. GERG-2008 brings its own ideal-gas part (Kunz & Wagner
 * 2012); Peng-Robinson is a residual equation only and takes the engine's NASA-polynomial ideal gas.
 */
export function compileEquation(id: 'peng-robinson' | 'gerg-2008', gas: GasModel): EquationOfState {
  if (id === 'gerg-2008') return compileGerg2008(gas.moleFractions as GergMoleFractions);
  return compilePengRobinson(gas.moleFractions, {
    ideal: idealGasFromGasModel(gas),
    molarMassKgPerKmol: gas.molarMassKgPerKmol,
  });
}
