import type { MoleFractions } from './composition';

/**
 * Dry air near sea level, mole fractions [pub: U.S. Standard Atmosphere 1976, Table 3; same as ISO 2533 at
 * low altitude]. The listed four sum to 0.99997 (the rest is Ne, He, Kr, ...); they are normalised to 1,
 * which gives M = 28.965 kg/kmol against the tabulated 28.9644 (which counts the trace gases): 2e-5 apart.
 */
const LISTED = { N2: 0.78084, O2: 0.209476, Ar: 0.00934, CO2: 0.000314 } as const;

const LISTED_SUM = LISTED.N2 + LISTED.O2 + LISTED.Ar + LISTED.CO2;

export const DRY_AIR_MOLE_FRACTIONS: Readonly<MoleFractions> = Object.freeze({
  N2: LISTED.N2 / LISTED_SUM,
  O2: LISTED.O2 / LISTED_SUM,
  Ar: LISTED.Ar / LISTED_SUM,
  CO2: LISTED.CO2 / LISTED_SUM,
});

export const DRY_AIR_SOURCE =
  'Dry air: N2 0.78084, O2 0.209476, Ar 0.00934, CO2 0.000314 (U.S. Standard Atmosphere 1976), normalised';
