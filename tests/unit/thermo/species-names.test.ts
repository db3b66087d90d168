import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SPECIES_IDS, checkComposition } from '@/lib/thermo';
import { speciesIdOf } from '@/lib/thermo/species-names';

const only = (name: string) => checkComposition({ [name]: 1 }, 'mole');

describe('common names for species in a component map', () => {
  it.each([
    ['methane', 'CH4'],
    ['Ethane', 'C2H6'],
    ['PROPANE', 'C3H8'],
    ['nC4H10', 'n-C4H10'],
    ['iC4H10', 'i-C4H10'],
    ['n-butane', 'n-C4H10'],
    ['isobutane', 'i-C4H10'],
    ['i-butane', 'i-C4H10'],
    ['nC5', 'n-C5H12'],
    ['iC5', 'i-C5H12'],
    ['n-pentane', 'n-C5H12'],
    ['isopentane', 'i-C5H12'],
    ['nC6', 'n-C6H14'],
    ['nC7', 'n-C7H16'],
    ['nC8', 'n-C8H18'],
    ['nC9', 'n-C9H20'],
    ['nC10', 'n-C10H22'],
    ['n-hexane', 'n-C6H14'],
    ['n-heptane', 'n-C7H16'],
    ['n-octane', 'n-C8H18'],
    ['n-nonane', 'n-C9H20'],
    ['n-decane', 'n-C10H22'],
    ['hydrogen sulfide', 'H2S'],
    ['Hydrogen Sulphide', 'H2S'],
    ['nitrogen', 'N2'],
    ['oxygen', 'O2'],
    ['argon', 'Ar'],
    ['helium', 'He'],
    ['carbon dioxide', 'CO2'],
    ['carbon-dioxide', 'CO2'],
    ['water', 'H2O'],
    ['hydrogen', 'H2'],
    ['carbon monoxide', 'CO'],
    ['ammonia', 'NH3'],
    ['ch4', 'CH4'],
    ['N-C10H22', 'n-C10H22'],
    ['h2s', 'H2S'],
  ])('"%s" is %s', (name, id) => {
    expect(only(name)).toEqual({ ok: true, moleFractions: { [id]: 1 } });
  });

  it('every id is found whatever its letter case', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...SPECIES_IDS),
        fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }),
        (id, upper) => {
          const name = [...id].map((c, i) => (upper[i % 8] ? c.toUpperCase() : c.toLowerCase())).join('');
          expect(speciesIdOf(name)).toBe(id);
        },
      ),
    );
  });

  it('a mixture written in names converts like the same mixture written in ids, mass basis too', () => {
    const named = checkComposition({ methane: 0.7, 'n-butane': 0.2, 'hydrogen sulfide': 0.1 }, 'mass');
    const ids = checkComposition({ CH4: 0.7, 'n-C4H10': 0.2, H2S: 0.1 }, 'mass');
    expect(named).toEqual(ids);
    expect(named.ok).toBe(true);
  });

  it.each([
    ['C4H10', /n-C4H10 \(n-butane\) or i-C4H10 \(isobutane\)/],
    ['butane', /n-C4H10 \(n-butane\) or i-C4H10 \(isobutane\)/],
    ['c5h12', /n-C5H12 \(n-pentane\) or i-C5H12 \(isopentane\)/],
  ])('refuses the ambiguous "%s", naming both isomers', (name, choices) => {
    const check = only(name);
    expect(check.ok).toBe(false);
    if (!check.ok) {
      expect(check.issues).toEqual([{ path: name, message: expect.stringMatching(/is ambiguous/) }]);
      expect(check.issues[0]!.message).toMatch(choices);
    }
  });

  it('refuses two keys for one species, naming both', () => {
    const check = checkComposition({ CH4: 0.5, methane: 0.5 }, 'mole');
    expect(check).toEqual({
      ok: false,
      issues: [{ path: 'methane', message: '"CH4" and "methane" both name CH4 (methane); give each species once' }],
    });
  });

  it('refuses an unknown name with the list of ids', () => {
    const check = checkComposition({ neopentane: 0.1, CH4: 0.9 }, 'mole');
    expect(check.ok).toBe(false);
    if (!check.ok) {
      expect(check.issues).toHaveLength(1);
      expect(check.issues[0]!.path).toBe('neopentane');
      for (const id of SPECIES_IDS) expect(check.issues[0]!.message).toContain(id);
    }
  });

  it('keeps reporting bad fractions by the key the caller wrote', () => {
    const check = checkComposition({ methane: 1.5, nitrogen: 'x' }, 'mole');
    expect(check).toEqual({
      ok: false,
      issues: [
        { path: 'methane', message: 'mole fraction must be a number from 0 to 1' },
        { path: 'nitrogen', message: 'mole fraction must be a number from 0 to 1' },
      ],
    });
  });

  it('a refused call leaves nothing behind for the next one', () => {
    checkComposition({ CH4: 0.5, methane: 0.5 }, 'mole');
    expect(checkComposition({ methane: 1 }, 'mole')).toEqual({ ok: true, moleFractions: { CH4: 1 } });
  });
});
