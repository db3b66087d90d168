import { SPECIES, SPECIES_IDS, type SpeciesId } from './species-data';

/** Fractions must sum to 1 within this absolute tolerance, then are normalised exactly. */
export const FRACTION_SUM_TOLERANCE = 1e-4;

export type CompositionBasis = 'mole' | 'mass';
export type MoleFractions = Partial<Record<SpeciesId, number>>;
export type CompositionIssue = { path: string; message: string };

export type CompositionCheck = { ok: true; moleFractions: MoleFractions } | { ok: false; issues: CompositionIssue[] };

const SPECIES_LIST = SPECIES_IDS.join(', ');

// Module-local copy: imported bindings are getters under tsx's CommonJS output, and these loops are hot.
const IDS: readonly SpeciesId[] = SPECIES_IDS;
const SPECIES_INDEX: ReadonlyMap<string, number> = new Map(SPECIES_IDS.map((id, i) => [id, i]));
const MOLAR_MASSES: readonly number[] = SPECIES_IDS.map((id) => SPECIES[id].molarMassKgPerKmol);
const COUNT = SPECIES_IDS.length;
const TOLERANCE = FRACTION_SUM_TOLERANCE;
// Reused between calls (single-threaded): the fractions in species order.
const scratch = new Float64Array(COUNT);

/**
 * Checks a component map (paths relative to it, e.g. "CH4") and converts it to normalised mole fractions.
 * Mass fractions are converted with the species molar masses.
 */
export function checkComposition(components: Record<string, unknown>, basis: CompositionBasis): CompositionCheck {
  let issues: CompositionIssue[] | null = null;
  scratch.fill(0);
  let sum = 0;
  let positive = 0;
  for (const name in components) {
    if (!Object.prototype.hasOwnProperty.call(components, name)) continue;
    const value = components[name];
    const index = SPECIES_INDEX.get(name);
    if (index === undefined) {
      (issues ??= []).push({ path: name, message: `unknown species "${name}"; allowed: ${SPECIES_LIST}` });
    } else if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > 1) {
      (issues ??= []).push({ path: name, message: `${basis} fraction must be a number from 0 to 1` });
    } else {
      sum += value;
      scratch[index] = value;
      if (value > 0) positive++;
    }
  }
  if (issues) return { ok: false, issues };
  if (positive === 0) {
    return { ok: false, issues: [{ path: '', message: 'give at least one component with a fraction above 0' }] };
  }
  if (Math.abs(sum - 1) > TOLERANCE) {
    return {
      ok: false,
      issues: [
        {
          path: '',
          message: `${basis} fractions sum to ${Number(sum.toPrecision(6))}; they must sum to 1 within ${TOLERANCE}`,
        },
      ],
    };
  }
  return { ok: true, moleFractions: toMoleFractions(basis) };
}

function toMoleFractions(basis: CompositionBasis): MoleFractions {
  // Mass basis: moles_i ∝ w_i / M_i. Either way normalise so the fractions sum to exactly 1.
  let total = 0;
  for (let i = 0; i < COUNT; i++) {
    if (basis === 'mass') scratch[i] = scratch[i]! / MOLAR_MASSES[i]!;
    total += scratch[i]!;
  }
  const result: MoleFractions = {};
  for (let i = 0; i < COUNT; i++) {
    const n = scratch[i]!;
    if (n > 0) result[IDS[i]!] = n / total;
  }
  return result;
}

/** A stable cache key for a set of mole fractions (resolution 1e-12, far below any measurement). */
export function compositionKey(moleFractions: MoleFractions): string {
  let key = 'mix';
  for (let i = 0; i < COUNT; i++) {
    const x = moleFractions[IDS[i]!];
    if (x !== undefined) key += `:${i}=${Math.round(x * 1e12)}`;
  }
  return key;
}

/** Mass fractions of a mole-fraction set (for reporting). */
export function massFractionsOf(moleFractions: MoleFractions): MoleFractions {
  let molarMass = 0;
  for (const id of SPECIES_IDS) molarMass += (moleFractions[id] ?? 0) * SPECIES[id].molarMassKgPerKmol;
  const result: MoleFractions = {};
  for (const id of SPECIES_IDS) {
    const x = moleFractions[id];
    if (x !== undefined) result[id] = (x * SPECIES[id].molarMassKgPerKmol) / molarMass;
  }
  return result;
}
