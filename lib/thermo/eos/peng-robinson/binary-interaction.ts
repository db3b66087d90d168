/*
 * Binary interaction parameters k_ij of the Peng-Robinson equation (van der Waals one-fluid mixing,
 * a_ij = sqrt(a_i a_j)(1 - k_ij)), temperature-independent.
 *
 * Primary source [pub: H. Knapp, R. Döring, L. Oellrich, U. Plöcker, J. M. Prausnitz, "Vapor-liquid equilibria
 * for mixtures of low boiling substances", DECHEMA Chemistry Data Series Vol. VI (1982)]; the page of each
 * binary's table is given beside it. Transcribed from the DECHEMA Peng-Robinson set as compiled in ChemSep's
 * interaction-parameter file pr.ipd (H. Kooijman, R. Taylor, 2009; Artistic License 2.0), which keeps the
 * DECHEMA page numbers.
 *
 * Where DECHEMA has no value:
 *   - water with methane, ethane, nitrogen (0.49) and propane (0.55) [pub: D. L. Parkhurst, C. A. J. Appelo,
 *     "Description of input and examples for PHREEQC version 3", USGS Techniques and Methods 6-A43 (2013),
 *     keyword GAS_BINARY_PARAMETERS, the built-in Peng-Robinson values];
 *   - water with butanes and heavier alkanes 0.50 [mem: the value commonly used for water-hydrocarbon pairs
 *     with PR, after Peng & Robinson's water-hydrocarbon work; not checked against a table here];
 *   - methane-hydrogen sulfide 0.08 [mem: widely quoted PR value; not checked against a table here];
 *   - every other pair: 0.
 * One published value is deliberately not used: DECHEMA p. 347 gives -0.40 for nitrogen/n-octane, out of line
 * with its neighbours (n-heptane 0.144, n-decane 0.112) and far outside the usual range; a negative k of that
 * size would make nitrogen dissolve in octane condensate several times over. 0 is used instead.
 */

type Row = readonly [string, string, number, string];

const ROWS: readonly Row[] = [
  ['He', 'CO', 0.5463, 'DECHEMA p. 203'],
  ['H2', 'N2', 0.0711, 'DECHEMA p. 210'],
  ['H2', 'CO', 0.0919, 'DECHEMA p. 215'],
  ['H2', 'CH4', -0.0044, 'DECHEMA p. 225'],
  ['H2', 'C2H6', -0.0781, 'DECHEMA p. 235'],
  ['H2', 'CO2', -0.1622, 'DECHEMA p. 242'],
  ['H2', 'C3H8', -0.1311, 'DECHEMA p. 245'],
  ['H2', 'n-C4H10', -0.397, 'DECHEMA p. 247'],
  ['H2', 'n-C6H14', -0.03, 'DECHEMA p. 250'],
  ['H2', 'n-C7H16', -0.1167, 'DECHEMA p. 253'],
  ['N2', 'CO', 0.03, 'DECHEMA p. 267'],
  ['N2', 'Ar', -0.0004, 'DECHEMA p. 271'],
  ['N2', 'O2', -0.0159, 'DECHEMA p. 277'],
  ['N2', 'CH4', 0.0289, 'DECHEMA p. 285'],
  ['N2', 'C2H6', 0.0533, 'DECHEMA p. 302'],
  ['N2', 'CO2', -0.0122, 'DECHEMA p. 312'],
  ['N2', 'H2S', 0.1652, 'DECHEMA p. 318'],
  ['N2', 'C3H8', 0.0878, 'DECHEMA p. 322'],
  ['N2', 'NH3', 0.2193, 'DECHEMA p. 326'],
  ['N2', 'i-C4H10', 0.1033, 'DECHEMA p. 330'],
  ['N2', 'n-C4H10', 0.0711, 'DECHEMA p. 333'],
  ['N2', 'i-C5H12', 0.0922, 'DECHEMA p. 336'],
  ['N2', 'n-C5H12', 0.1, 'DECHEMA p. 338'],
  ['N2', 'n-C6H14', 0.1496, 'DECHEMA p. 341'],
  ['N2', 'n-C7H16', 0.1441, 'DECHEMA p. 344'],
  ['N2', 'n-C10H22', 0.1122, 'DECHEMA p. 349'],
  ['CO', 'CH4', 0.03, 'DECHEMA p. 353'],
  ['CO', 'C2H6', -0.0226, 'DECHEMA p. 354'],
  ['CO', 'H2S', 0.0544, 'DECHEMA p. 356'],
  ['CO', 'C3H8', 0.0259, 'DECHEMA p. 358'],
  ['Ar', 'O2', 0.0089, 'DECHEMA p. 362'],
  ['Ar', 'CH4', 0.0152, 'DECHEMA p. 364'],
  ['Ar', 'NH3', -0.18, 'DECHEMA p. 371'],
  ['CH4', 'C2H6', -0.0059, 'DECHEMA p. 390'],
  ['CH4', 'CO2', 0.0978, 'DECHEMA p. 399'],
  ['CH4', 'C3H8', 0.0119, 'DECHEMA p. 413'],
  ['CH4', 'i-C4H10', 0.0256, 'DECHEMA p. 419'],
  ['CH4', 'n-C4H10', 0.0185, 'DECHEMA p. 425'],
  ['CH4', 'i-C5H12', -0.0056, 'DECHEMA p. 436'],
  ['CH4', 'n-C5H12', 0.023, 'DECHEMA p. 438'],
  ['CH4', 'n-C6H14', 0.04, 'DECHEMA p. 453'],
  ['CH4', 'n-C7H16', 0.03, 'DECHEMA p. 471'],
  ['CH4', 'n-C8H18', 0.0496, 'DECHEMA p. 477'],
  ['CH4', 'n-C9H20', 0.0474, 'DECHEMA p. 481'],
  ['CH4', 'n-C10H22', 0.0411, 'DECHEMA p. 486'],
  ['CO2', 'C2H6', 0.13, 'DECHEMA p. 527'],
  ['C2H6', 'H2S', 0.0952, 'DECHEMA p. 535'],
  ['C2H6', 'C3H8', 0.0011, 'DECHEMA p. 539'],
  ['C2H6', 'i-C4H10', -0.0067, 'DECHEMA p. 542'],
  ['C2H6', 'n-C4H10', 0.0089, 'DECHEMA p. 544'],
  ['C2H6', 'n-C5H12', 0.0078, 'DECHEMA p. 550'],
  ['C2H6', 'n-C6H14', -0.04, 'DECHEMA p. 557'],
  ['C2H6', 'n-C7H16', 0.0033, 'DECHEMA p. 568'],
  ['C2H6', 'n-C8H18', 0.0185, 'DECHEMA p. 570'],
  ['C2H6', 'n-C10H22', 0.0144, 'DECHEMA p. 572'],
  ['CO2', 'H2S', 0.0967, 'DECHEMA p. 583'],
  ['CO2', 'C3H8', 0.1315, 'DECHEMA p. 589'],
  ['CO2', 'i-C4H10', 0.13, 'DECHEMA p. 601'],
  ['CO2', 'n-C4H10', 0.1352, 'DECHEMA p. 607'],
  ['CO2', 'i-C5H12', 0.1219, 'DECHEMA p. 612'],
  ['CO2', 'n-C5H12', 0.1252, 'DECHEMA p. 617'],
  ['CO2', 'n-C6H14', 0.11, 'DECHEMA p. 625'],
  ['CO2', 'n-C7H16', 0.1, 'DECHEMA p. 631'],
  ['CO2', 'H2O', 0.0952, 'DECHEMA p. 635'],
  ['CO2', 'n-C10H22', 0.1141, 'DECHEMA p. 638'],
  ['H2S', 'C3H8', 0.0878, 'DECHEMA p. 644'],
  ['H2S', 'i-C4H10', 0.0474, 'DECHEMA p. 645'],
  ['H2S', 'n-C5H12', 0.063, 'DECHEMA p. 647'],
  ['H2S', 'H2O', 0.0394, 'DECHEMA p. 648'],
  ['H2S', 'n-C10H22', 0.0333, 'DECHEMA p. 652'],
  ['C3H8', 'i-C4H10', -0.0078, 'DECHEMA p. 663'],
  ['C3H8', 'n-C4H10', 0.0033, 'DECHEMA p. 666'],
  ['C3H8', 'i-C5H12', 0.0111, 'DECHEMA p. 668'],
  ['C3H8', 'n-C5H12', 0.0267, 'DECHEMA p. 671'],
  ['C3H8', 'n-C6H14', 0.0007, 'DECHEMA p. 674'],
  ['C3H8', 'n-C7H16', 0.0056, 'DECHEMA p. 681'],
  ['C3H8', 'n-C8H18', 0, 'DECHEMA p. 683'],
  ['C3H8', 'n-C10H22', 0, 'DECHEMA p. 686'],
  ['NH3', 'H2O', -0.2552, 'DECHEMA p. 690'],
  ['i-C4H10', 'n-C4H10', -0.0004, 'DECHEMA p. 694'],
  ['n-C4H10', 'n-C5H12', 0.0174, 'DECHEMA p. 704'],
  ['n-C4H10', 'n-C6H14', -0.0056, 'DECHEMA p. 706'],
  ['n-C4H10', 'n-C7H16', 0.0033, 'DECHEMA p. 707'],
  ['n-C4H10', 'n-C8H18', 0.0074, 'DECHEMA p. 708'],
  ['n-C4H10', 'n-C10H22', 0.0078, 'DECHEMA p. 710'],
  ['n-C5H12', 'n-C7H16', 0.0074, 'DECHEMA p. 720'],
  ['n-C5H12', 'n-C8H18', 0, 'DECHEMA p. 721'],
  ['n-C6H14', 'n-C7H16', -0.0078, 'DECHEMA p. 745'],
  ['H2O', 'CH4', 0.49, 'USGS TM 6-A43'],
  ['H2O', 'C2H6', 0.49, 'USGS TM 6-A43'],
  ['H2O', 'N2', 0.49, 'USGS TM 6-A43'],
  ['H2O', 'C3H8', 0.55, 'USGS TM 6-A43'],
  ['H2O', 'i-C4H10', 0.5, 'mem'],
  ['H2O', 'n-C4H10', 0.5, 'mem'],
  ['H2O', 'i-C5H12', 0.5, 'mem'],
  ['H2O', 'n-C5H12', 0.5, 'mem'],
  ['H2O', 'n-C6H14', 0.5, 'mem'],
  ['H2O', 'n-C7H16', 0.5, 'mem'],
  ['H2O', 'n-C8H18', 0.5, 'mem'],
  ['H2O', 'n-C9H20', 0.5, 'mem'],
  ['H2O', 'n-C10H22', 0.5, 'mem'],
  ['CH4', 'H2S', 0.08, 'mem'],
];

const TABLE: ReadonlyMap<string, { k: number; source: string }> = new Map(
  ROWS.flatMap(([a, b, k, source]) => [
    [`${a}|${b}`, { k, source }],
    [`${b}|${a}`, { k, source }],
  ]),
);

/** k_ij for two species ids (order does not matter); 0 for a pair with no published value and for i = j. */
export function interactionParameter(a: string, b: string): number {
  return a === b ? 0 : (TABLE.get(`${a}|${b}`)?.k ?? 0);
}

/** Where a pair's k_ij comes from ("DECHEMA p. 285", "USGS TM 6-A43", "mem"), or null when it is 0 by default. */
export function interactionParameterSource(a: string, b: string): string | null {
  return TABLE.get(`${a}|${b}`)?.source ?? null;
}

/** Every tabulated pair once, for checks and reports. */
export const INTERACTION_ROWS: readonly Row[] = ROWS;
