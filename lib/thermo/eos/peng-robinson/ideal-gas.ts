import { compileGas, type GasModel } from '../../gas-model';
import { cpMolar, enthalpyMolar, standardEntropyMolar } from '../../properties';
import { SPECIES, type SpeciesId } from '../../species-data';
import type { IdealGasModel } from '../types';
import { EosInputError } from './errors';

/** An IdealGasModel that also carries the molar mass it was built for. */
export type IdealGasWithMass = IdealGasModel & { readonly molarMassKgPerKmol: number };

/**
 * The engine's NASA-polynomial GasModel on the molar basis the EquationOfState contract uses: cp0 in J/(mol K),
 * h0 in J/mol on the NASA reference (enthalpy of formation included), s0 at 1 bar without the mixing term,
 * which cancels at fixed composition. Valid 200-6000 K; outside it the engine's ThermoRangeError is thrown.
 */
export function idealGasFromGasModel(gas: GasModel): IdealGasWithMass {
  return {
    molarMassKgPerKmol: gas.molarMassKgPerKmol,
    cp0: (T) => cpMolar(gas, T),
    h0: (T) => enthalpyMolar(gas, T),
    s0: (T) => standardEntropyMolar(gas, T),
  };
}

const NASA = SPECIES as Readonly<Record<string, { readonly molarMassKgPerKmol: number } | undefined>>;

function requireSpeciesData(fractions: Readonly<Record<string, number>>, what: string): void {
  for (const id of Object.keys(fractions)) {
    if (!NASA[id]) {
      throw new EosInputError(
        `components.${id}`,
        `no species data for "${id}"; pass options.${what} to build Peng-Robinson without it`,
      );
    }
  }
}

/** Mixture molar mass from the engine's species data, kg/kmol. */
export function molarMassOf(fractions: Readonly<Record<string, number>>): number {
  requireSpeciesData(fractions, 'molarMassKgPerKmol');
  let m = 0;
  for (const [id, x] of Object.entries(fractions)) m += x * NASA[id]!.molarMassKgPerKmol;
  return m;
}

/** The ideal-gas part for a composition from the engine's species data; throws for a species without NASA data. */
export function idealGasOf(fractions: Readonly<Record<string, number>>): IdealGasWithMass {
  requireSpeciesData(fractions, 'ideal');
  const gas = compileGas('peng-robinson', 'Peng-Robinson ideal part', fractions as Partial<Record<SpeciesId, number>>);
  return idealGasFromGasModel(gas);
}
