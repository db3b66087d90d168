/*
 * The 21 components of GERG-2008, with the molar masses and the critical parameters that the equation
 * uses as pure-fluid reducing values.
 * [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032-3091, Tables A1 and A5 (molar masses, T_c,i,
 * rho_c,i); the same values in ISO 20765-2:2015 and AGA Report No. 8 Part 2 (2017)], as distributed in
 * NIST's public-domain AGA8 reference implementation (usnistgov/AGA8, AGA8CODE/C/GERG2008.cpp).
 *
 * The ids double as species ids in the sizing engine. Their order is the paper's (n-butane before
 * isobutane, n-pentane before isopentane); NIST's files list the iso forms first.
 */

export const GERG_COMPONENT_IDS = [
  'CH4',
  'N2',
  'CO2',
  'C2H6',
  'C3H8',
  'n-C4H10',
  'i-C4H10',
  'n-C5H12',
  'i-C5H12',
  'n-C6H14',
  'n-C7H16',
  'n-C8H18',
  'n-C9H20',
  'n-C10H22',
  'H2',
  'O2',
  'CO',
  'H2O',
  'H2S',
  'He',
  'Ar',
] as const;

export type GergComponentId = (typeof GERG_COMPONENT_IDS)[number];

export type GergComponent = {
  readonly name: string;
  /** g/mol = kg/kmol */
  readonly molarMass: number;
  /** Critical temperature T_c,i, K: the pure fluid's reducing temperature. */
  readonly criticalTemperatureK: number;
  /** Critical density rho_c,i, mol/dm3 as published: the pure fluid's reducing density. */
  readonly criticalDensityMolPerDm3: number;
};

// [name, M (g/mol), T_c (K), rho_c (mol/dm3)]
type Row = readonly [string, number, number, number];

const ROWS: Readonly<Record<GergComponentId, Row>> = {
  CH4: ['methane', 16.04246, 190.564, 10.139342719],
  N2: ['nitrogen', 28.0134, 126.192, 11.1839],
  CO2: ['carbon dioxide', 44.0095, 304.1282, 10.624978698],
  C2H6: ['ethane', 30.06904, 305.322, 6.87085454],
  C3H8: ['propane', 44.09562, 369.825, 5.000043088],
  'n-C4H10': ['n-butane', 58.1222, 425.125, 3.920016792],
  'i-C4H10': ['isobutane', 58.1222, 407.817, 3.86014294],
  'n-C5H12': ['n-pentane', 72.14878, 469.7, 3.215577588],
  'i-C5H12': ['isopentane', 72.14878, 460.35, 3.271],
  'n-C6H14': ['n-hexane', 86.17536, 507.82, 2.705877875],
  'n-C7H16': ['n-heptane', 100.20194, 540.13, 2.315324434],
  'n-C8H18': ['n-octane', 114.22852, 569.32, 2.056404127],
  'n-C9H20': ['n-nonane', 128.2551, 594.55, 1.81],
  'n-C10H22': ['n-decane', 142.28168, 617.7, 1.64],
  H2: ['hydrogen', 2.01588, 33.19, 14.94],
  O2: ['oxygen', 31.9988, 154.595, 13.63],
  CO: ['carbon monoxide', 28.0101, 132.86, 10.85],
  H2O: ['water', 18.01528, 647.096, 17.87371609],
  H2S: ['hydrogen sulfide', 34.08088, 373.1, 10.19],
  He: ['helium', 4.002602, 5.1953, 17.399],
  Ar: ['argon', 39.948, 150.687, 13.407429659],
};

export const GERG_COMPONENTS: Readonly<Record<GergComponentId, GergComponent>> = Object.fromEntries(
  GERG_COMPONENT_IDS.map((id) => {
    const [name, molarMass, criticalTemperatureK, criticalDensityMolPerDm3] = ROWS[id];
    return [id, { name, molarMass, criticalTemperatureK, criticalDensityMolPerDm3 }];
  }),
) as Record<GergComponentId, GergComponent>;

/** The molar gas constant of GERG-2008, J/(mol K) [pub: Kunz & Wagner 2012, Sec. 7]. */
export const GERG_GAS_CONSTANT = 8.314472;

/**
 * The molar gas constant R* = 8.314510 J/(mol K) with which the ideal-gas heat capacities were fitted
 * [pub: Jaeschke & Schley, Int. J. Thermophys. 16 (1995) 1381]; GERG-2008's ideal part carries R* / R.
 */
export const GERG_IDEAL_FIT_GAS_CONSTANT = 8.31451;
