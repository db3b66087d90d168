import { GERG_COMPONENT_IDS, type GergComponentId } from '../components';

/*
 * Ideal-gas part of GERG-2008 for each pure component [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012)
 * 3032-3091, Eq. (7.2) and Table A1; the cp0 fits are those of Jaeschke & Schley, Int. J. Thermophys. 16
 * (1995) 1381]:
 *   cp0_i / R* = n3 + n4 (th4/T)^2 / sinh^2(th4/T) + n5 (th5/T)^2 / cosh^2(th5/T)
 *                   + n6 (th6/T)^2 / sinh^2(th6/T) + n7 (th7/T)^2 / cosh^2(th7/T)   + R/R*
 * with R* = 8.314510 J/(mol K). Transcribed from NIST's public-domain AGA8 reference implementation
 * (usnistgov/AGA8, AGA8CODE/C/GERG2008.cpp), which lists:
 *   - theta_k in kelvin (the paper gives theta_k / T_c,i);
 *   - n3 + 1 instead of n3 (4.00088 for methane where the paper has 3.00088); n3 below is the paper's;
 *   - its own integration constants n1, n2 for the dimensional form used in ./ideal-gas.ts. They put
 *     h0 = 0 and s0 = 0 at 298.15 K and 101.325 kPa for every component, the reference state of NIST's
 *     published check values, and replace the paper's n1, n2 (which belong to the reduced form).
 * A zero theta marks a term the component does not have.
 */

export type IdealGasCoefficients = {
  /** Entropy integration constant, dimensionless (NIST's reference state). */
  readonly n1: number;
  /** Enthalpy integration constant, K (NIST's reference state). */
  readonly n2: number;
  readonly n3: number;
  /** n4..n7 */
  readonly n: readonly [number, number, number, number];
  /** theta4..theta7, K: 4 and 6 are sinh terms, 5 and 7 cosh terms. */
  readonly theta: readonly [number, number, number, number];
};

// [n1, n2, n3, n4, n5, n6, n7, th4, th5, th6, th7]
type Row = readonly [number, number, number, number, number, number, number, number, number, number, number];

const ROWS: Readonly<Record<GergComponentId, Row>> = {
  CH4: [29.83843397, -15999.69151, 3.00088, 0.76315, 0.0046, 8.74432, -4.46921, 820.659, 178.41, 1062.82, 1090.53],
  N2: [17.56770785, -2801.729072, 2.50031, 0.13732, -0.1466, 0.90066, 0, 662.738, 680.562, 1740.06, 0],
  CO2: [20.65844696, -4902.171516, 2.50002, 2.04452, -1.06044, 2.03366, 0.01393, 919.306, 865.07, 483.553, 341.109],
  C2H6: [36.73005938, -23639.65301, 3.00263, 4.33939, 1.23722, 13.1974, -6.01989, 559.314, 223.284, 1031.38, 1071.29],
  C3H8: [44.70909619, -31236.63551, 3.02939, 6.60569, 3.197, 19.1921, -8.37267, 479.856, 200.893, 955.312, 1027.29],
  'n-C4H10': [36.53237783, -38957.80933, 3.33944, 9.44893, 6.89406, 24.4618, 14.7824, 468.27, 183.636, 1914.1, 903.185],
  'i-C4H10': [
    34.30180349, -38525.50276, 3.06714, 8.97575, 5.25156, 25.1423, 16.1388, 438.27, 198.018, 1905.02, 893.765,
  ],
  'n-C5H12': [42.67837089, -45215.83, 3, 8.95043, 21.836, 33.4032, 0, 178.67, 840.538, 1774.25, 0],
  'i-C5H12': [43.17218626, -51198.30946, 3, 11.7618, 20.1101, 33.1688, 0, 292.503, 910.237, 1919.37, 0],
  'n-C6H14': [46.99717188, -52746.83318, 3, 11.6977, 26.8142, 38.6164, 0, 182.326, 859.207, 1826.59, 0],
  'n-C7H16': [52.07631631, -57104.81056, 3, 13.7266, 30.4707, 43.5561, 0, 169.789, 836.195, 1760.46, 0],
  'n-C8H18': [57.25830934, -60546.76385, 3, 15.6865, 33.8029, 48.1731, 0, 158.922, 815.064, 1693.07, 0],
  'n-C9H20': [62.09646901, -66600.12837, 3, 18.0241, 38.1235, 53.3415, 0, 156.854, 814.882, 1693.79, 0],
  'n-C10H22': [65.93909154, -74131.45483, 3, 21.0069, 43.4931, 58.3657, 0, 164.947, 836.264, 1750.24, 0],
  H2: [13.07520288, -5836.943696, 1.47906, 0.95806, 0.45444, 1.56039, -1.3756, 228.734, 326.843, 1651.71, 1671.69],
  O2: [16.8017173, -2318.32269, 2.50146, 1.07558, 1.01334, 0, 0, 2235.71, 1116.69, 0, 0],
  CO: [17.45786899, -2635.244116, 2.50055, 1.02865, 0.00493, 0, 0, 1550.45, 704.525, 0, 0],
  H2O: [21.57882705, -7766.733078, 3.00392, 0.01059, 0.98763, 3.06904, 0, 268.795, 1141.41, 2507.37, 0],
  H2S: [21.5830944, -6069.035869, 3, 3.11942, 1.00243, 0, 0, 1833.63, 847.181, 0, 0],
  He: [10.04639507, -745.375, 1.5, 0, 0, 0, 0, 0, 0, 0, 0],
  Ar: [10.04639507, -745.375, 1.5, 0, 0, 0, 0, 0, 0, 0, 0],
};

function fromRow([n1, n2, n3, n4, n5, n6, n7, t4, t5, t6, t7]: Row): IdealGasCoefficients {
  return { n1, n2, n3, n: [n4, n5, n6, n7], theta: [t4, t5, t6, t7] };
}

export const IDEAL_GAS_COEFFICIENTS = Object.fromEntries(
  GERG_COMPONENT_IDS.map((id) => [id, fromRow(ROWS[id])]),
) as Readonly<Record<GergComponentId, IdealGasCoefficients>>;
