import { SPECIES, SPECIES_IDS, type SpeciesId } from './species-data';
import { AMBIGUOUS_NAME, choicesFor, speciesIndexOf } from './species-names';

/** Fractions must sum to 1 within this absolute tolerance, then are normalised exactly. */
export const FRACTION_SUM_TOLERANCE = 1e-4;

export type CompositionBasis = 'mole' | 'mass';
export type MoleFractions = Partial<Record<SpeciesId, number>>;
export type CompositionIssue = { path: string; message: string };

export type CompositionCheck = { ok: true; moleFractions: MoleFractions } | { ok: false; issues: CompositionIssue[] };

const SPECIES_LIST = SPECIES_IDS.join(', ');

// Module-local copy: imported bindings are getters under tsx's CommonJS output, and these loops are hot.
const IDS: readonly SpeciesId[] = SPECIES_IDS;
const MOLAR_MASSES: readonly number[] = SPECIES_IDS.map((id) => SPECIES[id].molarMassKgPerKmol);
const COUNT = SPECIES_IDS.length;
const TOLERANCE = FRACTION_SUM_TOLERANCE;
// Reused between calls (single-threaded): the fractions in species order, and the key that named each.
const scratch = new Float64Array(COUNT);
const namedBy: (string | undefined)[] = new Array<string | undefined>(COUNT);

/**
 * Checks a component map (paths relative to it, e.g. "CH4") and converts it to normalised mole fractions.
 * Keys are species ids or common names ("methane", "nC4", "hydrogen sulfide"; see species-names.ts); two
 * keys for one species are refused. Mass fractions are converted with the species molar masses.
 */
export function checkComposition(components: Record<string, unknown>, basis: CompositionBasis): CompositionCheck {
  let issues: CompositionIssue[] | null = null;
  scratch.fill(0);
  namedBy.fill(undefined);
  let sum = 0;
  let positive = 0;
  for (const name in components) {
    if (!Object.prototype.hasOwnProperty.call(components, name)) continue;
    const value = components[name];
    const index = speciesIndexOf(name);
    if (index < 0) {
      (issues ??= []).push({ path: name, message: nameMessage(name, index) });
      continue;
    }
    const prior = namedBy[index];
    if (prior !== undefined) {
      const id = IDS[index]!;
      const message = `"${prior}" and "${name}" both name ${id} (${SPECIES[id].name}); give each species once`;
      (issues ??= []).push({ path: name, message });
      continue;
    }
    namedBy[index] = name;
    if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > 1) {
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

function nameMessage(name: string, index: number): string {
  return index === AMBIGUOUS_NAME
    ? `"${name}" is ambiguous: give ${choicesFor(name)}`
    : `unknown species "${name}"; allowed: ${SPECIES_LIST} (or a common name such as methane or n-butane)`;
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
