import { componentsFor, type PengRobinsonComponents, type PengRobinsonOptions } from './components';
import { EosInputError } from './errors';

/** Mole fractions by species id; ids of the engine (SpeciesId) or any id with critical constants. */
export type SpeciesFractions = Readonly<Record<string, number | undefined>>;

/** Fractions must sum to 1 within this, then are normalised (the engine's composition check uses the same). */
const SUM_TOLERANCE = 1e-4;

/** A checked composition: the species present (x > 0), sorted by id, and their normalised fractions. */
export type PreparedComposition = {
  readonly sys: PengRobinsonComponents;
  readonly x: Float64Array;
};

/**
 * Checks a mole-fraction map (each value finite in [0, 1], sum 1 within 1e-4, at least one above 0, critical
 * constants known) and returns the component set of the species present with their normalised fractions.
 * Throws EosInputError naming the field.
 */
export function prepareComposition(fractions: SpeciesFractions, options?: PengRobinsonOptions): PreparedComposition {
  if (typeof fractions !== 'object' || fractions === null) {
    throw new EosInputError('components', 'components must be an object of mole fractions by species id');
  }
  const ids: string[] = [];
  let sum = 0;
  for (const id of Object.keys(fractions).sort()) {
    const v = fractions[id];
    if (v === undefined) continue;
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0 || v > 1) {
      throw new EosInputError(
        `components.${id}`,
        `mole fraction of ${id} must be a number from 0 to 1; got ${String(v)}`,
      );
    }
    if (v > 0) ids.push(id);
    sum += v;
  }
  if (ids.length === 0) throw new EosInputError('components', 'give at least one component with a fraction above 0');
  if (Math.abs(sum - 1) > SUM_TOLERANCE) {
    throw new EosInputError(
      'components',
      `mole fractions sum to ${Number(sum.toPrecision(6))}; they must sum to 1 within ${SUM_TOLERANCE}`,
    );
  }
  const sys = componentsFor(ids, options);
  const x = new Float64Array(ids.length);
  for (let i = 0; i < ids.length; i++) x[i] = fractions[ids[i]!]! / sum;
  return { sys, x };
}

/** A composition array (in `sys.ids` order) back to a map, dropping nothing. */
export function fractionsOf(ids: readonly string[], x: ArrayLike<number>): Record<string, number> {
  const result: Record<string, number> = {};
  for (let i = 0; i < ids.length; i++) result[ids[i]!] = x[i]!;
  return result;
}
