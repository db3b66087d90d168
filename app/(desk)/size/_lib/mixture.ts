import { parseNumeric } from '@/lib/engine/schema-fields';
import { FRACTION_SUM_TOLERANCE, SPECIES, SPECIES_IDS, findPreset, type SpeciesId } from '@/lib/thermo';
import type { MixtureRow } from './form-types';

export { FRACTION_SUM_TOLERANCE };

/** Species the mixture editor offers, with their names ("CH4 methane"). */
export const SPECIES_OPTIONS = SPECIES_IDS.map((id: SpeciesId) => ({ value: id, label: `${id} ${SPECIES[id].name}` }));

export type MixtureSum = { sum: number; readable: boolean; ok: boolean };

/** The live sum of the typed fractions; `readable` is false while any entry is not a number. */
export function mixtureSum(rows: readonly MixtureRow[]): MixtureSum {
  let sum = 0;
  let readable = true;
  for (const row of rows) {
    if (row.fraction.trim() === '') continue;
    const x = parseNumeric(row.fraction);
    if (!Number.isFinite(x)) readable = false;
    else sum += x;
  }
  return { sum, readable, ok: readable && Math.abs(sum - 1) <= FRACTION_SUM_TOLERANCE };
}

/** Scales every fraction so they sum to 1 (six decimals); null when there is nothing positive to scale. */
export function normaliseRows(rows: readonly MixtureRow[]): MixtureRow[] | null {
  const { sum, readable } = mixtureSum(rows);
  if (!readable || !(sum > 0)) return null;
  return rows.map((row) => {
    if (row.fraction.trim() === '') return row;
    return { ...row, fraction: String(Number((parseNumeric(row.fraction) / sum).toFixed(6))) };
  });
}

/** A preset's composition as editable rows (mole fractions), or null for presets without a fixed one. */
export function presetRows(presetId: string): MixtureRow[] | null {
  const preset = findPreset(presetId);
  if (!preset?.moleFractions) return null;
  return Object.entries(preset.moleFractions).map(([species, x]) => ({
    species,
    fraction: String(Number((x ?? 0).toPrecision(6))),
  }));
}
