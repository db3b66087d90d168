import { molarMassFromAtoms, type Element } from './atomic-weights';
import { HEAVY_ROWS } from './species-rows-heavy';
import { LIGHT_ROWS } from './species-rows-light';

/*
 * NASA 7-coefficient ideal-gas polynomials, two ranges 200-1000 K and 1000-6000 K:
 *   cp/R = a1 + a2 T + a3 T^2 + a4 T^3 + a5 T^4
 *   h/(RT) = a1 + a2 T/2 + a3 T^2/3 + a4 T^3/4 + a5 T^4/5 + a6/T
 *   s°/R = a1 ln T + a2 T + a3 T^2/2 + a4 T^3/3 + a5 T^4/4 + a7   (p° = 1 bar)
 * Every set shares Tmid = 1000 K and the 200-6000 K range, which is what lets a mixture fold into one
 * polynomial. The sets and their sources are in species-rows-light.ts and species-rows-heavy.ts; each is
 * checked for continuity at 1000 K and against published heat capacities in tests/unit/thermo.
 */

/** The species the property data cover, in a fixed order (gas-model caches and keys depend on it). */
export const SPECIES_IDS = [
  'N2',
  'O2',
  'Ar',
  'He',
  'CO2',
  'H2O',
  'H2',
  'CH4',
  'CO',
  'C2H6',
  'C3H8',
  'NH3',
  'n-C4H10',
  'i-C4H10',
  'n-C5H12',
  'i-C5H12',
  'n-C6H14',
  'n-C7H16',
  'n-C8H18',
  'n-C9H20',
  'n-C10H22',
  'H2S',
] as const;
export type SpeciesId = (typeof SPECIES_IDS)[number];

/** a1..a7 for one temperature range. */
export type NasaCoefficients = readonly [number, number, number, number, number, number, number];

/** One transcribed set as the data files hold it. */
export type SpeciesRow = {
  readonly id: SpeciesId;
  readonly name: string;
  readonly atoms: Partial<Record<Element, number>>;
  /** Where the coefficients were read, short enough for a property-basis footnote. */
  readonly source: string;
  readonly low: NasaCoefficients;
  readonly high: NasaCoefficients;
};

export type SpeciesData = SpeciesRow & { readonly molarMassKgPerKmol: number };

function assemble(rows: readonly SpeciesRow[]): Record<SpeciesId, SpeciesData> {
  const out: Partial<Record<SpeciesId, SpeciesData>> = {};
  for (const row of rows) {
    if (out[row.id]) throw new Error(`species data: ${row.id} is given twice`);
    out[row.id] = { ...row, molarMassKgPerKmol: molarMassFromAtoms(row.atoms) };
  }
  for (const id of SPECIES_IDS) if (!out[id]) throw new Error(`species data: no coefficient set for ${id}`);
  return out as Record<SpeciesId, SpeciesData>;
}

export const SPECIES: Readonly<Record<SpeciesId, SpeciesData>> = assemble([...LIGHT_ROWS, ...HEAVY_ROWS]);

const SPECIES_SET: ReadonlySet<string> = new Set(SPECIES_IDS);

/** True for the species the property data cover. */
export function isSpeciesId(value: string): value is SpeciesId {
  return SPECIES_SET.has(value);
}
