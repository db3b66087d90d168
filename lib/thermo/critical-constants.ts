import type { SpeciesId } from './species-data';

/**
 * Critical temperature (K), critical pressure (bar), acentric factor and, where there is one, the normal
 * boiling point (K, at 101.325 kPa). Used to judge whether the ideal-gas assumption holds and where a
 * component may condense; never in the ideal-gas property calculation itself.
 */
export type CriticalConstants = {
  readonly tcK: number;
  readonly pcBar: number;
  readonly omega: number;
  /** Normal boiling point; absent for gases with no liquid at 1 atm (CO2 sublimes). */
  readonly tbK?: number;
};

/*
 * All rows are the critical point, acentric factor and normal boiling point of the reference equation of
 * state for each fluid as CoolProp 8.0 implements it [calc: CoolProp 8.0]. Poling, Prausnitz & O'Connell, The
 * Properties of Gases and Liquids, 5th ed., Appendix A, lists close values [mem]; where the two differ the
 * reference-equation value is kept. Equations behind them, by group:
 */
export const CRITICAL_CONSTANTS: Readonly<Record<SpeciesId, CriticalConstants>> = {
  // Air gases, water, hydrogen, ammonia: Span et al. 2000 (N2), Schmidt & Wagner 1985 (O2), Tegeler et al.
  // 1999 (Ar), Ortiz-Vega et al. 2019 (He), Span & Wagner 1996 (CO2), IAPWS-95 (H2O), Leachman et al. 2009
  // (normal H2), Lemmon & Span 2006 (CO), Gao et al. 2020 (NH3).
  N2: { tcK: 126.192, pcBar: 33.958, omega: 0.0372, tbK: 77.355 },
  O2: { tcK: 154.599, pcBar: 50.464, omega: 0.0222, tbK: 90.188 },
  Ar: { tcK: 150.687, pcBar: 48.63, omega: -0.0022, tbK: 87.302 },
  He: { tcK: 5.195, pcBar: 2.283, omega: -0.3835, tbK: 4.224 },
  CO2: { tcK: 304.128, pcBar: 73.773, omega: 0.2239 }, // triple point 216.59 K at 5.18 bar: no liquid at 1 atm
  H2O: { tcK: 647.096, pcBar: 220.64, omega: 0.3443, tbK: 373.124 },
  H2: { tcK: 33.144, pcBar: 12.964, omega: -0.219, tbK: 20.369 },
  CO: { tcK: 132.86, pcBar: 34.982, omega: 0.0497, tbK: 81.638 },
  NH3: { tcK: 405.56, pcBar: 113.634, omega: 0.2557, tbK: 239.834 },

  // C1-C4 alkanes: Setzmann & Wagner 1991 (CH4), Buecker & Wagner 2006 (C2H6, butanes), Lemmon et al. 2009 (C3H8).
  CH4: { tcK: 190.564, pcBar: 45.992, omega: 0.0114, tbK: 111.667 },
  C2H6: { tcK: 305.322, pcBar: 48.722, omega: 0.099, tbK: 184.569 },
  C3H8: { tcK: 369.89, pcBar: 42.512, omega: 0.1521, tbK: 231.036 },
  'n-C4H10': { tcK: 425.125, pcBar: 37.96, omega: 0.2008, tbK: 272.66 },
  'i-C4H10': { tcK: 407.81, pcBar: 36.29, omega: 0.1835, tbK: 261.401 },

  // C5-C10 alkanes: Thol et al. 2019 (n-pentane, n-hexane), Lemmon & Span 2006 (isopentane, n-nonane,
  // n-decane), Span & Wagner 2003 (n-heptane), Beckmüller et al. 2019 (n-octane).
  'n-C5H12': { tcK: 469.7, pcBar: 33.675, omega: 0.251, tbK: 309.209 },
  'i-C5H12': { tcK: 460.35, pcBar: 33.782, omega: 0.2274, tbK: 300.976 },
  'n-C6H14': { tcK: 507.82, pcBar: 30.441, omega: 0.3003, tbK: 341.866 },
  // Span & Wagner's short equation puts its own critical point 1 K above the published Tc 540.13 K; the row
  // keeps the published Tc and the equation's pressure there.
  'n-C7H16': { tcK: 540.13, pcBar: 27.326, omega: 0.349, tbK: 371.533 },
  'n-C8H18': { tcK: 568.74, pcBar: 24.836, omega: 0.3975, tbK: 398.794 },
  'n-C9H20': { tcK: 594.55, pcBar: 22.819, omega: 0.4433, tbK: 423.913 },
  'n-C10H22': { tcK: 617.7, pcBar: 21.013, omega: 0.4884, tbK: 447.27 },

  // Hydrogen sulfide: Lemmon & Span 2006.
  H2S: { tcK: 373.101, pcBar: 89.989, omega: 0.1005, tbK: 212.855 },
};
