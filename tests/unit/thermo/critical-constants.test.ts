import { describe, expect, it } from 'vitest';
import { CRITICAL_CONSTANTS, SPECIES_IDS, type SpeciesId } from '@/lib/thermo';

/*
 * Tc, pc, ω and Tb come from different places in each reference equation, so a unit slip (kPa for bar) or a
 * swapped row shows as disagreement between them. The Lee-Kesler vapour-pressure equation gives ω from the
 * other three [pub: Lee & Kesler, AIChE J. 21 (1975) 510; as in Poling, Prausnitz & O'Connell, eq. 7-4.1]:
 *   ω = α/β, α = -ln(pc/1 atm) - 5.92714 + 6.09648/θ + 1.28862 ln θ - 0.169347 θ^6,
 *            β = 15.2518 - 15.6875/θ - 13.4721 ln θ + 0.43577 θ^6,  θ = Tb/Tc.
 * It reproduces tabulated ω to about 0.01 for non-polar fluids [cp]; polar water and ammonia are looser.
 */
function leeKeslerOmega(tcK: number, pcBar: number, tbK: number): number {
  const theta = tbK / tcK;
  const alpha =
    -Math.log(pcBar / 1.01325) - 5.92714 + 6.09648 / theta + 1.28862 * Math.log(theta) - 0.169347 * theta ** 6;
  const beta = 15.2518 - 15.6875 / theta - 13.4721 * Math.log(theta) + 0.43577 * theta ** 6;
  return alpha / beta;
}

const POLAR: readonly SpeciesId[] = ['H2O', 'NH3'];

describe('critical constants', () => {
  it.each([...SPECIES_IDS])('%s has a critical point, and boils below it', (id) => {
    const c = CRITICAL_CONSTANTS[id];
    expect(c.tcK).toBeGreaterThan(0);
    expect(c.pcBar).toBeGreaterThan(1);
    if (c.tbK !== undefined) expect(c.tbK).toBeLessThan(c.tcK);
  });

  it('every species but CO2 (which sublimes at 1 atm) has a normal boiling point', () => {
    expect(SPECIES_IDS.filter((id) => CRITICAL_CONSTANTS[id].tbK === undefined)).toEqual(['CO2']);
  });

  it.each(SPECIES_IDS.filter((id) => id !== 'CO2'))('%s: ω agrees with Tb, Tc and pc by Lee-Kesler', (id) => {
    const { tcK, pcBar, omega, tbK } = CRITICAL_CONSTANTS[id];
    const tolerance = POLAR.includes(id) ? 0.03 : 0.012;
    expect(Math.abs(leeKeslerOmega(tcK, pcBar, tbK!) - omega)).toBeLessThan(tolerance);
  });

  it('heavier n-alkanes have higher Tc and ω, C1 to C10, and lower pc from C2 on', () => {
    const chain: SpeciesId[] = ['CH4', 'C2H6', 'C3H8', 'n-C4H10', 'n-C5H12', 'n-C6H14', 'n-C7H16', 'n-C8H18'];
    chain.push('n-C9H20', 'n-C10H22');
    for (let i = 1; i < chain.length; i++) {
      const [a, b] = [CRITICAL_CONSTANTS[chain[i - 1]!], CRITICAL_CONSTANTS[chain[i]!]];
      expect(b.tcK).toBeGreaterThan(a.tcK);
      expect(b.omega).toBeGreaterThan(a.omega);
      if (i > 1) expect(b.pcBar).toBeLessThan(a.pcBar);
    }
  });
});
