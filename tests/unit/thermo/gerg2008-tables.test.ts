import { describe, expect, it } from 'vitest';
import { GERG_COMPONENTS, GERG_COMPONENT_IDS, type GergComponentId } from '@/lib/thermo/eos/gerg2008';
import { BINARY_REDUCING_ROWS } from '@/lib/thermo/eos/gerg2008/data/binary-reducing-parameters';
import { DEPARTURE_BINARIES } from '@/lib/thermo/eos/gerg2008/data/departure-functions';
import { IDEAL_GAS_COEFFICIENTS } from '@/lib/thermo/eos/gerg2008/data/ideal-gas-coefficients';
import { PURE_FLUID_EQUATIONS } from '@/lib/thermo/eos/gerg2008/data/pure-fluid-coefficients';
import { reducingValues } from '@/lib/thermo/eos/gerg2008/reducing';

/*
 * The shape of the transcribed tables against the description in Kunz & Wagner, J. Chem. Eng. Data 57
 * (2012) 3032-3091 [pub], Sec. 7 and Tables A2-A8: term counts per pure fluid (K_pol + K_exp), the 15
 * binaries with a departure function (7 specific, 8 sharing the generalized one) and their F_ij, and the
 * 210 binary reducing-parameter sets.
 */

// [K_pol, K_exp] [pub: Kunz & Wagner 2012, Tables A2-A4]
const TERM_COUNTS: Record<GergComponentId, [number, number]> = {
  CH4: [6, 18],
  N2: [6, 18],
  CO2: [4, 18],
  C2H6: [6, 18],
  C3H8: [6, 6],
  'n-C4H10': [6, 6],
  'i-C4H10': [6, 6],
  'n-C5H12': [6, 6],
  'i-C5H12': [6, 6],
  'n-C6H14': [6, 6],
  'n-C7H16': [6, 6],
  'n-C8H18': [6, 6],
  'n-C9H20': [6, 6],
  'n-C10H22': [6, 6],
  H2: [5, 9],
  O2: [6, 6],
  CO: [6, 6],
  H2O: [7, 9],
  H2S: [6, 6],
  He: [4, 8],
  Ar: [6, 6],
};

describe('GERG-2008 tables', () => {
  it.each(GERG_COMPONENT_IDS)('%s has the published number of polynomial and exponential terms', (id) => {
    const { exponents, n } = PURE_FLUID_EQUATIONS[id];
    const [kPol, kExp] = TERM_COUNTS[id];
    expect(n).toHaveLength(kPol + kExp);
    expect(exponents).toHaveLength(kPol + kExp);
    // Polynomial terms first, then exponential ones (c >= 1), as the equations are written.
    expect(exponents.map(([, , c]) => c === 0)).toEqual([...Array(kPol).fill(true), ...Array(kExp).fill(false)]);
  });

  it('lists the 15 binaries with departure functions and their F_ij [pub: Table A6]', () => {
    const byPair = new Map(DEPARTURE_BINARIES.map(([a, b, f, fn]) => [`${a}/${b}`, [f, fn.name, fn.terms.length]]));
    expect(byPair.size).toBe(15);
    expect(byPair.get('CH4/N2')).toEqual([1, 'methane-nitrogen', 9]);
    expect(byPair.get('CH4/CO2')).toEqual([1, 'methane-carbon dioxide', 6]);
    expect(byPair.get('CH4/C2H6')).toEqual([1, 'methane-ethane', 12]);
    expect(byPair.get('CH4/C3H8')).toEqual([1, 'methane-propane', 9]);
    expect(byPair.get('N2/CO2')).toEqual([1, 'nitrogen-carbon dioxide', 6]);
    expect(byPair.get('N2/C2H6')).toEqual([1, 'nitrogen-ethane', 6]);
    expect(byPair.get('CH4/H2')).toEqual([1, 'methane-hydrogen', 4]);
    expect(byPair.get('CH4/n-C4H10')).toEqual([1, 'generalized', 10]);
    expect(byPair.get('CH4/i-C4H10')).toEqual([0.771035405688, 'generalized', 10]);
    expect(byPair.get('C2H6/C3H8')).toEqual([0.13042476515, 'generalized', 10]);
    expect(byPair.get('C2H6/n-C4H10')).toEqual([0.281570073085, 'generalized', 10]);
    expect(byPair.get('C2H6/i-C4H10')).toEqual([0.260632376098, 'generalized', 10]);
    expect(byPair.get('C3H8/n-C4H10')).toEqual([0.0312572600489, 'generalized', 10]);
    expect(byPair.get('C3H8/i-C4H10')).toEqual([-0.0551609771024, 'generalized', 10]);
    expect(byPair.get('n-C4H10/i-C4H10')).toEqual([-0.0551240293009, 'generalized', 10]);
    const polynomialCounts = Object.fromEntries(DEPARTURE_BINARIES.map(([, , , fn]) => [fn.name, fn.polynomialTerms]));
    expect(polynomialCounts).toEqual({
      'methane-nitrogen': 2,
      'methane-carbon dioxide': 3,
      'methane-ethane': 2,
      'methane-propane': 5,
      'nitrogen-carbon dioxide': 2,
      'nitrogen-ethane': 3,
      'methane-hydrogen': 4,
      generalized: 10,
    });
    for (const [, , , fn] of DEPARTURE_BINARIES) {
      fn.terms.forEach((term, k) => expect(term).toHaveLength(k < fn.polynomialTerms ? 3 : 7));
    }
  });

  it('has one reducing-parameter set for each of the 210 pairs, all positive', () => {
    const pairs = new Set(BINARY_REDUCING_ROWS.map(([a, b]) => [a, b].sort().join('/')));
    expect(BINARY_REDUCING_ROWS).toHaveLength(210);
    expect(pairs.size).toBe(210);
    for (const row of BINARY_REDUCING_ROWS) {
      expect(row[0]).not.toBe(row[1]);
      for (const value of row.slice(2)) expect(value).toBeGreaterThan(0);
    }
  });

  it('gives the same reducing values whichever way round a pair is taken', () => {
    for (const [a, b] of BINARY_REDUCING_ROWS) {
      const forward = reducingValues([a, b], [0.3, 0.7]);
      const reverse = reducingValues([b, a], [0.7, 0.3]);
      expect(reverse.temperatureK / forward.temperatureK - 1).toBeCloseTo(0, 13);
      expect(reverse.densityMolPerM3 / forward.densityMolPerM3 - 1).toBeCloseTo(0, 13);
    }
  });

  it('reduces a pure fluid by its own critical point', () => {
    for (const id of GERG_COMPONENT_IDS) {
      const { temperatureK, densityMolPerM3 } = reducingValues([id], [1]);
      expect(temperatureK).toBe(GERG_COMPONENTS[id].criticalTemperatureK);
      expect(densityMolPerM3 / (GERG_COMPONENTS[id].criticalDensityMolPerDm3 * 1000) - 1).toBeCloseTo(0, 14);
    }
  });

  it('has ideal-gas coefficients for every component, with hyperbolic terms only where theta > 0', () => {
    for (const id of GERG_COMPONENT_IDS) {
      const { n, theta } = IDEAL_GAS_COEFFICIENTS[id];
      theta.forEach((th, k) => {
        if (th === 0) expect(n[k]).toBe(0);
        else expect(th).toBeGreaterThan(100);
      });
    }
  });
});
