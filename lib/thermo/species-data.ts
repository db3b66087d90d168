import { molarMassFromAtoms, type Element } from './atomic-weights';

/*
 * NASA 7-coefficient ideal-gas polynomials, two ranges 200-1000 K and 1000-6000 K:
 *   cp/R = a1 + a2 T + a3 T^2 + a4 T^3 + a5 T^4
 *   h/(RT) = a1 + a2 T/2 + a3 T^2/3 + a4 T^3/4 + a5 T^4/5 + a6/T
 *   s°/R = a1 ln T + a2 T + a3 T^2/2 + a4 T^3/3 + a5 T^4/4 + a7   (p° = 1 bar)
 * [pub: McBride, Gordon & Reno, NASA TM-4513 (1993)], as distributed in Cantera's data/nasa_gas.yaml
 * (BSD-3; the data are NASA's). Transcribed from ../shared/ENGINEERING.md; checked against NIST-JANAF cp
 * and continuity at 1000 K in tests/unit/thermo.
 */

export const SPECIES_IDS = ['N2', 'O2', 'Ar', 'He', 'CO2', 'H2O', 'H2', 'CH4', 'CO', 'C2H6', 'C3H8', 'NH3'] as const;
export type SpeciesId = (typeof SPECIES_IDS)[number];

/** a1..a7 for one temperature range. */
export type NasaCoefficients = readonly [number, number, number, number, number, number, number];

export type SpeciesData = {
  readonly id: SpeciesId;
  readonly name: string;
  readonly atoms: Partial<Record<Element, number>>;
  readonly molarMassKgPerKmol: number;
  readonly low: NasaCoefficients;
  readonly high: NasaCoefficients;
};

type Row = [SpeciesId, string, Partial<Record<Element, number>>, NasaCoefficients, NasaCoefficients];

const MONATOMIC_CP = [2.5, 0, 0, 0, 0] as const;

const ROWS: Row[] = [
  [
    'N2',
    'nitrogen',
    { N: 2 },
    [3.53100528, -1.23660987e-4, -5.02999437e-7, 2.43530612e-9, -1.40881235e-12, -1046.97628, 2.96747468],
    [2.95257626, 1.39690057e-3, -4.92631691e-7, 7.86010367e-11, -4.60755321e-15, -923.948645, 5.87189252],
  ],
  [
    'O2',
    'oxygen',
    { O: 2 },
    [3.78245636, -2.99673415e-3, 9.847302e-6, -9.68129508e-9, 3.24372836e-12, -1063.94356, 3.65767573],
    [3.66096083, 6.56365523e-4, -1.41149485e-7, 2.05797658e-11, -1.29913248e-15, -1215.97725, 3.41536184],
  ],
  ['Ar', 'argon', { Ar: 1 }, [...MONATOMIC_CP, -745.375, 4.37967491], [...MONATOMIC_CP, -745.375, 4.37967491]],
  ['He', 'helium', { He: 1 }, [...MONATOMIC_CP, -745.375, 0.928724724], [...MONATOMIC_CP, -745.375, 0.928724724]],
  [
    'CO2',
    'carbon dioxide',
    { C: 1, O: 2 },
    [2.35677352, 8.98459677e-3, -7.12356269e-6, 2.45919022e-9, -1.43699548e-13, -48371.9697, 9.90105222],
    [4.63659493, 2.74131991e-3, -9.95828531e-7, 1.60373011e-10, -9.16103468e-15, -49024.9341, -1.93534855],
  ],
  [
    'H2O',
    'water vapour',
    { H: 2, O: 1 },
    [4.19864056, -2.0364341e-3, 6.52040211e-6, -5.48797062e-9, 1.77197817e-12, -30293.7267, -0.849032208],
    [2.67703787, 2.97318329e-3, -7.7376969e-7, 9.44336689e-11, -4.26900959e-15, -29885.8938, 6.88255571],
  ],
  [
    'H2',
    'hydrogen',
    { H: 2 },
    [2.34433112, 7.98052075e-3, -1.9478151e-5, 2.01572094e-8, -7.37611761e-12, -917.935173, 0.683010238],
    [2.93286579, 8.26607967e-4, -1.46402335e-7, 1.54100359e-11, -6.88804432e-16, -813.065597, -1.02432887],
  ],
  [
    'CH4',
    'methane',
    { C: 1, H: 4 },
    [5.14987613, -0.0136709788, 4.91800599e-5, -4.84743026e-8, 1.66693956e-11, -10246.6476, -4.64130376],
    [1.63552643, 0.0100842795, -3.36916254e-6, 5.34958667e-10, -3.15518833e-14, -10005.6455, 9.99313326],
  ],
  [
    'CO',
    'carbon monoxide',
    { C: 1, O: 1 },
    [3.57953347, -6.1035368e-4, 1.01681433e-6, 9.07005884e-10, -9.04424499e-13, -14344.086, 3.50840928],
    [3.04848583, 1.35172818e-3, -4.85794075e-7, 7.88536486e-11, -4.69807489e-15, -14266.1171, 6.0170979],
  ],
  [
    'C2H6',
    'ethane',
    { C: 2, H: 6 },
    [4.29142492, -5.5015427e-3, 5.99438288e-5, -7.08466285e-8, 2.68685771e-11, -11522.2055, 2.66682316],
    [4.04666674, 0.0153538766, -5.47039321e-6, 8.77826228e-10, -5.23167305e-14, -12447.3512, -0.968683607],
  ],
  [
    'C3H8',
    'propane',
    { C: 3, H: 8 },
    [4.2110262, 1.71599803e-3, 7.06183472e-5, -9.19594116e-8, 3.64421372e-11, -14381.2106, 5.60930491],
    [6.66789363, 0.0206120214, -7.36553027e-6, 1.18440761e-9, -7.0695321e-14, -16274.8521, -13.1859503],
  ],
  [
    'NH3',
    'ammonia',
    { N: 1, H: 3 },
    [4.30177808, -4.7712733e-3, 2.19341619e-5, -2.29856489e-8, 8.28992268e-12, -6748.06394, -0.690644393],
    [2.71709692, 5.56856338e-3, -1.76886396e-6, 2.6741726e-10, -1.52731419e-14, -6584.51989, 6.09289837],
  ],
];

export const SPECIES: Readonly<Record<SpeciesId, SpeciesData>> = Object.fromEntries(
  ROWS.map(([id, name, atoms, low, high]) => [
    id,
    { id, name, atoms, molarMassKgPerKmol: molarMassFromAtoms(atoms), low, high },
  ]),
) as Record<SpeciesId, SpeciesData>;

const SPECIES_SET: ReadonlySet<string> = new Set(SPECIES_IDS);

/** True for the species the property data cover. */
export function isSpeciesId(value: string): value is SpeciesId {
  return SPECIES_SET.has(value);
}
