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
};
