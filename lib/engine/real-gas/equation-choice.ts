import type { EquationOfStateId } from '../../thermo/eos/types';
import type { GasModel } from '../../thermo/gas-model';
import type { SpeciesId } from '../../thermo/species-data';

/** The 21 components of GERG-2008 [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032, Table 1]. */
export const GERG_2008_SPECIES: ReadonlySet<string> = new Set([
  'CH4',
  'N2',
  'CO2',
  'C2H6',
  'C3H8',
  'n-C4H10',
  'i-C4H10',
  'n-C5H12',
  'i-C5H12',
  'n-C6H14',
  'n-C7H16',
  'n-C8H18',
  'n-C9H20',
  'n-C10H22',
  'H2',
  'O2',
  'CO',
  'H2O',
  'H2S',
  'He',
  'Ar',
]);

export type EquationChoice = {
  id: EquationOfStateId;
  /** What the request asked for; null when the engine chose. */
  requested: EquationOfStateId | null;
  /** One sentence for the desk and the datasheet: why this equation. */
  reason: string;
};

/** Components of the gas that GERG-2008 does not cover. */
export function outsideGerg(gas: GasModel): SpeciesId[] {
  return (Object.keys(gas.moleFractions) as SpeciesId[]).filter((id) => !GERG_2008_SPECIES.has(id));
}

/**
 * The equation a sizing uses: the one asked for, else GERG-2008 when it covers every component and
 * Peng-Robinson otherwise.
 */
export function chooseEquation(gas: GasModel, requested: EquationOfStateId | undefined): EquationChoice {
  if (requested === 'ideal-gas') {
    return { id: 'ideal-gas', requested, reason: 'as requested: Z = 1, no real-gas departures' };
  }
  if (requested === 'peng-robinson') {
    return { id: requested, requested, reason: 'as requested' };
  }
  const missing = outsideGerg(gas);
  if (requested === 'gerg-2008') {
    return { id: requested, requested, reason: 'as requested' };
  }
  if (missing.length === 0) {
    return { id: 'gerg-2008', requested: null, reason: 'chosen by the engine: it covers every component of this gas' };
  }
  return {
    id: 'peng-robinson',
    requested: null,
    reason: `chosen by the engine: GERG-2008 does not cover ${missing.join(', ')}`,
  };
}
