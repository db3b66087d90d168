import type { SpeciesId } from './species-data';

/**
 * Critical temperature (K), critical pressure (bar) and acentric factor per species, used only to judge
 * whether the ideal-gas assumption holds [mem: standard property tables, e.g. Poling, Prausnitz &
 * O'Connell, The Properties of Gases and Liquids, 5th ed., Appendix A].
 */
export type CriticalConstants = { readonly tcK: number; readonly pcBar: number; readonly omega: number };

export const CRITICAL_CONSTANTS: Readonly<Record<SpeciesId, CriticalConstants>> = {
  N2: { tcK: 126.2, pcBar: 33.98, omega: 0.037 },
  O2: { tcK: 154.58, pcBar: 50.43, omega: 0.022 },
  Ar: { tcK: 150.86, pcBar: 48.98, omega: -0.002 },
  He: { tcK: 5.19, pcBar: 2.27, omega: -0.39 },
  CO2: { tcK: 304.13, pcBar: 73.77, omega: 0.224 },
  H2O: { tcK: 647.1, pcBar: 220.64, omega: 0.345 },
  H2: { tcK: 33.19, pcBar: 13.13, omega: -0.216 },
  CH4: { tcK: 190.56, pcBar: 45.99, omega: 0.011 },
  CO: { tcK: 132.85, pcBar: 34.94, omega: 0.045 },
  C2H6: { tcK: 305.32, pcBar: 48.72, omega: 0.099 },
  C3H8: { tcK: 369.83, pcBar: 42.48, omega: 0.152 },
  NH3: { tcK: 405.4, pcBar: 113.53, omega: 0.253 },
  // Added species: critical point and acentric factor of the reference equation of state of each as CoolProp 8.0
  // implements it [calc: CoolProp 8.0]; n-heptane keeps the published Tc 540.13 K of Span & Wagner (2003).
  'n-C4H10': { tcK: 425.125, pcBar: 37.96, omega: 0.2008 },
  'i-C4H10': { tcK: 407.81, pcBar: 36.29, omega: 0.1835 },
  'n-C5H12': { tcK: 469.7, pcBar: 33.675, omega: 0.251 },
  'i-C5H12': { tcK: 460.35, pcBar: 33.782, omega: 0.2274 },
  'n-C6H14': { tcK: 507.82, pcBar: 30.441, omega: 0.3003 },
  'n-C7H16': { tcK: 540.13, pcBar: 27.326, omega: 0.349 },
  'n-C8H18': { tcK: 568.74, pcBar: 24.836, omega: 0.3975 },
  'n-C9H20': { tcK: 594.55, pcBar: 22.819, omega: 0.4433 },
  'n-C10H22': { tcK: 617.7, pcBar: 21.013, omega: 0.4884 },
  H2S: { tcK: 373.101, pcBar: 89.989, omega: 0.1005 },
};
