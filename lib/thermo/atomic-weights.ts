/**
 * Standard atomic weights, g/mol, abridged to the conventional values for elements whose weight is given as
 * an interval (H, C, N, O, S) [pub: CIAAW 2021 standard atomic weights].
 */
export const ATOMIC_WEIGHTS = {
  H: 1.008,
  C: 12.011,
  N: 14.007,
  O: 15.999,
  S: 32.06,
  Ar: 39.948,
  He: 4.002602,
} as const;

export type Element = keyof typeof ATOMIC_WEIGHTS;

/** Molar mass, kg/kmol (= g/mol), from an element count such as { C: 1, O: 2 }. */
export function molarMassFromAtoms(atoms: Partial<Record<Element, number>>): number {
  let total = 0;
  for (const [element, count] of Object.entries(atoms) as [Element, number][]) {
    total += ATOMIC_WEIGHTS[element] * count;
  }
  return total;
}
