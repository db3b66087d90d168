import type { GergComponentId } from '../components';
import { BINARY_REDUCING_HEAVY } from './binary-reducing-heavy';
import { BINARY_REDUCING_LIGHT } from './binary-reducing-light';

/**
 * One row of Table A5 of Kunz & Wagner (2012): [A, B, beta_v, gamma_v, beta_T, gamma_T]. The betas apply
 * with A as the first component, i.e. in (x_A + x_B) / (beta^2 x_A + x_B); for the reverse order use
 * 1/beta. All 210 pairs of the 21 components are listed, those without fitted values as 1.
 */
export type BinaryReducingRow = readonly [
  a: GergComponentId,
  b: GergComponentId,
  betaV: number,
  gammaV: number,
  betaT: number,
  gammaT: number,
];

export const BINARY_REDUCING_ROWS: readonly BinaryReducingRow[] = [...BINARY_REDUCING_LIGHT, ...BINARY_REDUCING_HEAVY];

export type BinaryReducingParameters = {
  readonly betaV: number;
  readonly gammaV: number;
  readonly betaT: number;
  readonly gammaT: number;
};

const byPair = new Map<string, BinaryReducingRow>(BINARY_REDUCING_ROWS.map((row) => [`${row[0]}|${row[1]}`, row]));

/** The reducing-function parameters of the pair (a, b), oriented with a first. */
export function binaryReducingParameters(a: GergComponentId, b: GergComponentId): BinaryReducingParameters {
  const forward = byPair.get(`${a}|${b}`);
  if (forward) return { betaV: forward[2], gammaV: forward[3], betaT: forward[4], gammaT: forward[5] };
  const reverse = byPair.get(`${b}|${a}`);
  if (reverse) return { betaV: 1 / reverse[2], gammaV: reverse[3], betaT: 1 / reverse[4], gammaT: reverse[5] };
  throw new Error(`GERG-2008 has no reducing parameters for ${a}/${b}`);
}
