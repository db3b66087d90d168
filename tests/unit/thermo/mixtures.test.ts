import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DRY_AIR_MOLE_FRACTIONS,
  FRACTION_SUM_TOLERANCE,
  GAS_CONSTANT_J_PER_MOL_K,
  GAS_PRESETS,
  SPECIES_IDS,
  checkComposition,
  compileGas,
  cpMass,
  cpMolar,
  cvMass,
  enthalpyMass,
  heatCapacityRatio,
  mixtureGas,
  presetGas,
  type SpeciesId,
} from '@/lib/thermo';

const air = presetGas('air')!;

describe('dry air preset', () => {
  it('has the U.S. Standard Atmosphere 1976 composition, normalised [pub: USSA 1976 Table 3]', () => {
    expect(DRY_AIR_MOLE_FRACTIONS.N2! / DRY_AIR_MOLE_FRACTIONS.O2!).toBeCloseTo(0.78084 / 0.209476, 10);
    expect(Object.values(DRY_AIR_MOLE_FRACTIONS).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
  });

  it('molar mass within 0.003 % of the tabulated 28.9644 kg/kmol [pub: USSA 1976]', () => {
    expect(Math.abs(air.molarMassKgPerKmol / 28.9644 - 1)).toBeLessThan(3e-5);
  });

  // Ideal-gas specific heats of air at 300 K: cp 1.005, cv 0.718 kJ/(kg K), k 1.400 [mem: standard thermodynamics texts].
  it('cp, cv and k at 300 K match the ideal-gas air table', () => {
    expect(cpMass(air, 300) / 1000).toBeCloseTo(1.005, 2);
    expect(cvMass(air, 300) / 1000).toBeCloseTo(0.718, 2);
    expect(heatCapacityRatio(air, 300)).toBeCloseTo(1.4, 3);
  });

  // h(1000 K) - h(300 K) = 1046.04 - 300.19 = 745.85 kJ/kg [mem: ideal-gas air tables, Keenan-Kaye based].
  it('h(1000 K) - h(300 K) within 0.1 % of the air table', () => {
    const dh = (enthalpyMass(air, 1000) - enthalpyMass(air, 300)) / 1000;
    expect(Math.abs(dh / 745.85 - 1)).toBeLessThan(0.001);
  });
});

describe('heat-capacity ratio of simple gases near room temperature [cp: common practice]', () => {
  it.each(['argon', 'helium'])('%s (monatomic) k = 1.667', (id) => {
    expect(heatCapacityRatio(presetGas(id)!, 300)).toBeCloseTo(5 / 3, 6);
  });
  it.each(['nitrogen', 'oxygen', 'carbon-monoxide', 'hydrogen', 'air'])('%s (diatomic or air) k ≈ 1.40', (id) => {
    expect(Math.abs(heatCapacityRatio(presetGas(id)!, 300) - 1.4)).toBeLessThan(0.01);
  });
});

describe('mixture rules', () => {
  const gasIds = GAS_PRESETS.filter((p) => p.moleFractions).map((p) => p.id);

  it('cp - cv = R for every preset at every temperature in range [ideal gas]', () => {
    fc.assert(
      fc.property(fc.constantFrom(...gasIds), fc.double({ min: 200, max: 6000, noNaN: true }), (id, t) => {
        const gas = presetGas(id)!;
        expect(cpMass(gas, t) - cvMass(gas, t)).toBeCloseTo(
          (GAS_CONSTANT_J_PER_MOL_K * 1000) / gas.molarMassKgPerKmol,
          9,
        );
      }),
    );
  });

  it('mixture molar cp is the mole-fraction sum of the species values', () => {
    const species = fc.constantFrom(...SPECIES_IDS);
    fc.assert(
      fc.property(
        species,
        species,
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 200, max: 6000, noNaN: true }),
        (a, b, x, t) => {
          fc.pre(a !== b);
          const mix = compileGas('t', 't', { [a]: x, [b]: 1 - x } as Partial<Record<SpeciesId, number>>);
          const expected =
            x * cpMolar(compileGas(a, a, { [a]: 1 }), t) + (1 - x) * cpMolar(compileGas(b, b, { [b]: 1 }), t);
          expect(cpMolar(mix, t)).toBeCloseTo(expected, 8);
        },
      ),
    );
  });

  it('converts mass fractions with the molar masses: 50/50 by mass CH4/N2 is 63.6 mol % CH4 [calc]', () => {
    const check = checkComposition({ CH4: 0.5, N2: 0.5 }, 'mass');
    expect(check.ok).toBe(true);
    if (check.ok) expect(check.moleFractions.CH4).toBeCloseTo(28.014 / (28.014 + 16.043), 10);
  });

  it(`accepts sums within ${FRACTION_SUM_TOLERANCE} and normalises them exactly`, () => {
    const check = checkComposition({ CH4: 0.90005, C2H6: 0.05, N2: 0.05 }, 'mole');
    expect(check.ok).toBe(true);
    if (check.ok) expect(Object.values(check.moleFractions).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
  });

  it('refuses fractions that do not sum to 1, naming the sum', () => {
    const check = checkComposition({ CH4: 0.9, N2: 0.05 }, 'mole');
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.issues[0]!.message).toMatch(/sum to 0\.95/);
  });

  it('refuses unknown species and out-of-range fractions, each by name', () => {
    const check = checkComposition({ CH4: 1.2, XE: 0.1, N2: -0.1 }, 'mole');
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.issues.map((i) => i.path).sort()).toEqual(['CH4', 'N2', 'XE']);
  });

  it('caches compiled mixtures by composition', () => {
    const a = mixtureGas({ CH4: 0.9, N2: 0.1 });
    expect(mixtureGas({ N2: 0.1, CH4: 0.9 })).toBe(a);
    expect(mixtureGas({ CH4: 0.8, N2: 0.2 })).not.toBe(a);
  });
});
