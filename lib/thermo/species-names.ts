import { SPECIES, SPECIES_IDS, type SpeciesId } from './species-data';

/*
 * Names accepted for each species besides its id, as gas analyses and data sheets write them [cp]. Matching
 * ignores case, spaces, hyphens and underscores, so "n-C4H10", "nC4H10" and "N C4 H10" are one name, as are
 * "carbon dioxide" and "Carbon-Dioxide".
 *
 * Where Dutywise offers two isomers (butanes, pentanes) a bare formula or the unprefixed name commonly means
 * the commercial mixture of both, so it is refused with the choice spelled out. From C6 up only the normal
 * isomer is offered and "hexane" is taken as n-hexane, the usual lumping of a C6+ analysis.
 */
const ALIASES: Readonly<Record<SpeciesId, readonly string[]>> = {
  N2: ['nitrogen'],
  O2: ['oxygen'],
  Ar: ['argon'],
  He: ['helium'],
  CO2: ['carbon dioxide'],
  H2O: ['water', 'water vapour', 'water vapor', 'steam'],
  H2: ['hydrogen'],
  CH4: ['methane', 'C1'],
  CO: ['carbon monoxide'],
  C2H6: ['ethane', 'C2'],
  C3H8: ['propane', 'C3'],
  NH3: ['ammonia'],
  'n-C4H10': ['n-butane', 'normal butane', 'nC4'],
  'i-C4H10': ['isobutane', 'i-butane', 'iso-butane', '2-methylpropane', 'iC4'],
  'n-C5H12': ['n-pentane', 'normal pentane', 'nC5'],
  'i-C5H12': ['isopentane', 'i-pentane', 'iso-pentane', '2-methylbutane', 'iC5'],
  'n-C6H14': ['n-hexane', 'hexane', 'nC6', 'C6H14'],
  'n-C7H16': ['n-heptane', 'heptane', 'nC7', 'C7H16'],
  'n-C8H18': ['n-octane', 'octane', 'nC8', 'C8H18'],
  'n-C9H20': ['n-nonane', 'nonane', 'nC9', 'C9H20'],
  'n-C10H22': ['n-decane', 'decane', 'nC10', 'C10H22'],
  H2S: ['hydrogen sulfide', 'hydrogen sulphide'],
};

const AMBIGUOUS: Readonly<Record<string, readonly SpeciesId[]>> = {
  C4H10: ['n-C4H10', 'i-C4H10'],
  C4: ['n-C4H10', 'i-C4H10'],
  butane: ['n-C4H10', 'i-C4H10'],
  butanes: ['n-C4H10', 'i-C4H10'],
  C5H12: ['n-C5H12', 'i-C5H12'],
  C5: ['n-C5H12', 'i-C5H12'],
  pentane: ['n-C5H12', 'i-C5H12'],
  pentanes: ['n-C5H12', 'i-C5H12'],
};

/** speciesIndexOf's answer for a name that stands for more than one species. */
export const AMBIGUOUS_NAME = -2;
/** speciesIndexOf's answer for a name it does not know. */
export const UNKNOWN_NAME = -1;

const fold = (name: string) => name.toLowerCase().replace(/[\s_-]+/g, '');

const EXACT: ReadonlyMap<string, number> = new Map(SPECIES_IDS.map((id, i) => [id, i]));
const FOLDED: ReadonlyMap<string, number> = buildFolded();

function buildFolded(): Map<string, number> {
  const map = new Map<string, number>();
  const add = (name: string, index: number) => {
    const key = fold(name);
    const prior = map.get(key);
    if (prior !== undefined && prior !== index) throw new Error(`species names: "${name}" is given twice`);
    map.set(key, index);
  };
  SPECIES_IDS.forEach((id, i) => [id, ...ALIASES[id]].forEach((name) => add(name, i)));
  for (const name of Object.keys(AMBIGUOUS)) add(name, AMBIGUOUS_NAME);
  return map;
}

/**
 * Index in SPECIES_IDS of the species a name stands for, UNKNOWN_NAME or AMBIGUOUS_NAME. An exact id is found
 * without allocating; only other spellings are folded.
 */
export function speciesIndexOf(name: string): number {
  return EXACT.get(name) ?? FOLDED.get(fold(name)) ?? UNKNOWN_NAME;
}

/** The species id a name stands for, or undefined when it is unknown or ambiguous. */
export function speciesIdOf(name: string): SpeciesId | undefined {
  const index = speciesIndexOf(name);
  return index >= 0 ? SPECIES_IDS[index] : undefined;
}

/** "n-C4H10 (n-butane) or i-C4H10 (isobutane)" for an ambiguous name, for its error message. */
export function choicesFor(name: string): string {
  const key = Object.keys(AMBIGUOUS).find((k) => fold(k) === fold(name));
  const ids = key ? AMBIGUOUS[key]! : [];
  return ids.map((id) => `${id} (${SPECIES[id].name})`).join(' or ');
}
