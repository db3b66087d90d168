import type { GergComponentId } from '../components';

/*
 * Departure functions of GERG-2008:
 *   alpha^r_ij(delta, tau) = sum_{k=1..Kpol} n_k delta^d_k tau^t_k
 *     + sum_{k=Kpol+1..Kpol+Kexp} n_k delta^d_k tau^t_k exp(-eta_k (delta - eps_k)^2 - beta_k (delta - gamma_k))
 * and the binaries that carry one, with their factor F_ij
 * [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032-3091, Eq. (7.10) and Tables A6-A8], transcribed
 * from NIST's public-domain AGA8 reference implementation (usnistgov/AGA8, AGA8CODE/C/GERG2008.cpp).
 *
 * Rows are [n, d, t] for the Kpol polynomial terms and [n, d, t, eta, eps, beta, gamma] for the rest.
 */

export type DepartureTerm = readonly [
  n: number,
  d: number,
  t: number,
  eta?: number,
  eps?: number,
  beta?: number,
  gamma?: number,
];

export type DepartureFunction = {
  readonly name: string;
  readonly polynomialTerms: number;
  readonly terms: readonly DepartureTerm[];
};

const METHANE_NITROGEN: DepartureFunction = {
  name: 'methane-nitrogen',
  polynomialTerms: 2,
  terms: [
    [-9.8038985517335e-3, 1, 0],
    [4.2487270143005e-4, 4, 1.85],
    [-0.034800214576142, 1, 7.85, 1, 0.5, 1, 0.5],
    [-0.13333813013896, 2, 5.4, 1, 0.5, 1, 0.5],
    [-0.011993694974627, 2, 0, 0.25, 0.5, 2.5, 0.5],
    [0.069243379775168, 2, 0.75, 0, 0.5, 3, 0.5],
    [-0.31022508148249, 2, 2.8, 0, 0.5, 3, 0.5],
    [0.24495491753226, 2, 4.45, 0, 0.5, 3, 0.5],
    [0.22369816716981, 3, 4.25, 0, 0.5, 3, 0.5],
  ],
};

const METHANE_CO2: DepartureFunction = {
  name: 'methane-carbon dioxide',
  polynomialTerms: 3,
  terms: [
    [-0.10859387354942, 1, 2.6],
    [0.080228576727389, 2, 1.95],
    [-9.3303985115717e-3, 3, 0],
    [0.040989274005848, 1, 3.95, 1, 0.5, 1, 0.5],
    [-0.24338019772494, 2, 7.95, 0.5, 0.5, 2, 0.5],
    [0.23855347281124, 3, 8, 0, 0.5, 3, 0.5],
  ],
};

const METHANE_ETHANE: DepartureFunction = {
  name: 'methane-ethane',
  polynomialTerms: 2,
  terms: [
    [-8.0926050298746e-4, 3, 0.65],
    [-7.5381925080059e-4, 4, 1.55],
    [-0.041618768891219, 1, 3.1, 1, 0.5, 1, 0.5],
    [-0.23452173681569, 2, 5.9, 1, 0.5, 1, 0.5],
    [0.14003840584586, 2, 7.05, 1, 0.5, 1, 0.5],
    [0.063281744807738, 2, 3.35, 0.875, 0.5, 1.25, 0.5],
    [-0.034660425848809, 2, 1.2, 0.75, 0.5, 1.5, 0.5],
    [-0.23918747334251, 2, 5.8, 0.5, 0.5, 2, 0.5],
    [1.9855255066891e-3, 2, 2.7, 0, 0.5, 3, 0.5],
    [6.1777746171555, 3, 0.45, 0, 0.5, 3, 0.5],
    [-6.9575358271105, 3, 0.55, 0, 0.5, 3, 0.5],
    [1.0630185306388, 3, 1.95, 0, 0.5, 3, 0.5],
  ],
};

const METHANE_PROPANE: DepartureFunction = {
  name: 'methane-propane',
  polynomialTerms: 5,
  terms: [
    [0.013746429958576, 3, 1.85],
    [-7.4425012129552e-3, 3, 3.95],
    [-4.5516600213685e-3, 4, 0],
    [-5.4546603350237e-3, 4, 1.85],
    [2.3682016824471e-3, 4, 3.85],
    [0.18007763721438, 1, 5.25, 0.25, 0.5, 0.75, 0.5],
    [-0.44773942932486, 1, 3.85, 0.25, 0.5, 1, 0.5],
    [0.0193273748882, 1, 0.2, 0, 0.5, 2, 0.5],
    [-0.30632197804624, 2, 6.5, 0, 0.5, 3, 0.5],
  ],
};

const NITROGEN_CO2: DepartureFunction = {
  name: 'nitrogen-carbon dioxide',
  polynomialTerms: 2,
  terms: [
    [0.28661625028399, 2, 1.85],
    [-0.10919833861247, 3, 1.4],
    [-1.137403208227, 1, 3.2, 0.25, 0.5, 0.75, 0.5],
    [0.76580544237358, 1, 2.5, 0.25, 0.5, 1, 0.5],
    [4.2638000926819e-3, 1, 8, 0, 0.5, 2, 0.5],
    [0.17673538204534, 2, 3.75, 0, 0.5, 3, 0.5],
  ],
};

const NITROGEN_ETHANE: DepartureFunction = {
  name: 'nitrogen-ethane',
  polynomialTerms: 3,
  terms: [
    [-0.47376518126608, 2, 0],
    [0.48961193461001, 2, 0.05],
    [-5.7011062090535e-3, 3, 0],
    [-0.1996682004132, 1, 3.65, 1, 0.5, 1, 0.5],
    [-0.69411103101723, 2, 4.9, 1, 0.5, 1, 0.5],
    [0.69226192739021, 2, 4.45, 0.875, 0.5, 1.25, 0.5],
  ],
};

const METHANE_HYDROGEN: DepartureFunction = {
  name: 'methane-hydrogen',
  polynomialTerms: 4,
  terms: [
    [-0.25157134971934, 1, 2],
    [-6.2203841111983e-3, 3, -1],
    [0.088850315184396, 3, 1.75],
    [-0.035592212573239, 4, 1.4],
  ],
};

/** The generalized departure function for the binaries among methane, ethane, propane and the butanes. */
const GENERALIZED: DepartureFunction = {
  name: 'generalized',
  polynomialTerms: 10,
  terms: [
    [2.5574776844118, 1, 1],
    [-7.9846357136353, 1, 1.55],
    [4.7859131465806, 1, 1.7],
    [-0.73265392369587, 2, 0.25],
    [1.3805471345312, 2, 1.35],
    [0.28349603476365, 3, 0],
    [-0.49087385940425, 3, 1.25],
    [-0.10291888921447, 4, 0],
    [0.11836314681968, 4, 0.7],
    [5.5527385721943e-5, 4, 5.4],
  ],
};

export type DepartureBinary = readonly [a: GergComponentId, b: GergComponentId, f: number, fn: DepartureFunction];

/** The 15 binaries with a departure function, and F_ij [pub: Kunz & Wagner 2012, Table A6]. */
export const DEPARTURE_BINARIES: readonly DepartureBinary[] = [
  ['CH4', 'N2', 1, METHANE_NITROGEN],
  ['CH4', 'CO2', 1, METHANE_CO2],
  ['CH4', 'C2H6', 1, METHANE_ETHANE],
  ['CH4', 'C3H8', 1, METHANE_PROPANE],
  ['N2', 'CO2', 1, NITROGEN_CO2],
  ['N2', 'C2H6', 1, NITROGEN_ETHANE],
  ['CH4', 'H2', 1, METHANE_HYDROGEN],
  ['CH4', 'n-C4H10', 1, GENERALIZED],
  ['CH4', 'i-C4H10', 0.771035405688, GENERALIZED],
  ['C2H6', 'C3H8', 0.13042476515, GENERALIZED],
  ['C2H6', 'n-C4H10', 0.281570073085, GENERALIZED],
  ['C2H6', 'i-C4H10', 0.260632376098, GENERALIZED],
  ['C3H8', 'n-C4H10', 0.0312572600489, GENERALIZED],
  ['C3H8', 'i-C4H10', -0.0551609771024, GENERALIZED],
  ['n-C4H10', 'i-C4H10', -0.0551240293009, GENERALIZED],
];
