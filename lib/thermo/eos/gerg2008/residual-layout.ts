import type { MixtureTerms } from './terms';

/*
 * Packs a mixture's merged terms (./terms.ts) into the typed arrays that ./residual.ts loops over.
 *
 * Every term is n tau^t g(delta), and g depends only on d and on the exponential factor: exp(-delta^c)
 * (pure fluids) or one of a few Gaussian bells (departure functions). Terms with the same g form a group,
 * so a group needs only its temperature sums
 *   S0 = sum n tau^t,  S1 = sum n t tau^t,  S2 = sum n t (t + 1) tau^t,
 * which change only with T, and its density factor, which changes only with rho. A 5-component natural gas
 * has about 110 terms in about 40 groups.
 *
 * tau^t is split as tau^floor(t) tau^frac(t). Every exponent in GERG-2008 is a multiple of 1/40 (those of
 * the pure fluids of 1/8, those of the departure functions of 1/20), so all the powers come from one exp()
 * for tau^(1/40) and multiplications, instead of about 70 exp() calls; the chained products lose at most
 * a few units in the 15th digit.
 */

export type ResidualLayout = {
  /** Per term: n, n t, n t (t + 1). */
  readonly termCoefficients: Float64Array;
  /** Per term: group, floor(t) - minIntegerExponent, 40 frac(t). */
  readonly termIndex: Int32Array;
  readonly minIntegerExponent: number;
  readonly integerExponentCount: number;
  readonly groupCount: number;
  /** Polynomial groups come first: d per group. */
  readonly polynomialD: Float64Array;
  /** exp(-delta^c) groups next: d and c per group. */
  readonly powerExpD: Float64Array;
  readonly powerExpC: Int32Array;
  /** The distinct c values, for one exp(-delta^c) each. */
  readonly cValues: Int32Array;
  /** Gaussian groups last: d and bell index per group. */
  readonly gaussianD: Float64Array;
  readonly gaussianBell: Int32Array;
  /** Per bell: eta, eps, beta, gamma. */
  readonly bells: Float64Array;
  readonly maxPower: number;
};

/** Exponents t are multiples of 1 / EXPONENT_STEPS. */
export const EXPONENT_STEPS = 40;

export function layoutTerms(terms: MixtureTerms): ResidualLayout {
  const { polynomial, powerExponential, gaussian } = terms;
  const groups = new Map<string, number>();
  const polynomialD: number[] = [];
  const powerExpD: number[] = [];
  const powerExpC: number[] = [];
  const gaussianD: number[] = [];
  const gaussianBell: number[] = [];
  const bellKeys: string[] = [];
  const all: { n: number; t: number; group: number }[] = [];

  const groupOf = (key: string, create: () => void) => {
    let group = groups.get(key);
    if (group === undefined) {
      group = groups.size;
      groups.set(key, group);
      create();
    }
    return group;
  };
  // Groups are numbered kind by kind: all polynomial, then all exp(-delta^c), then all Gaussian.
  for (const { n, d, t } of polynomial) all.push({ n, t, group: groupOf(`p${d}`, () => polynomialD.push(d)) });
  for (const { n, d, t, c } of powerExponential) {
    all.push({ n, t, group: groupOf(`e${d}|${c}`, () => (powerExpD.push(d), powerExpC.push(c))) });
  }
  for (const { n, d, t, eta, eps, beta, gamma } of gaussian) {
    const bellKey = `${eta}|${eps}|${beta}|${gamma}`;
    if (!bellKeys.includes(bellKey)) bellKeys.push(bellKey);
    const bell = bellKeys.indexOf(bellKey);
    all.push({ n, t, group: groupOf(`g${d}|${bell}`, () => (gaussianD.push(d), gaussianBell.push(bell))) });
  }

  const integerPart = all.map(({ t }) => Math.floor(t));
  const fortieths = all.map(({ t }, k) => {
    const steps = (t - integerPart[k]!) * EXPONENT_STEPS;
    if (Math.abs(steps - Math.round(steps)) > 1e-9) throw new Error(`exponent ${t} is not a multiple of 1/40`);
    return Math.round(steps);
  });
  const minIntegerExponent = Math.min(0, ...integerPart);
  const maxIntegerExponent = Math.max(0, ...integerPart);

  const termCoefficients = new Float64Array(all.length * 3);
  const termIndex = new Int32Array(all.length * 3);
  all.forEach(({ n, t, group }, k) => {
    termCoefficients.set([n, n * t, n * t * (t + 1)], k * 3);
    termIndex.set([group, integerPart[k]! - minIntegerExponent, fortieths[k]!], k * 3);
  });
  const cValues = [...new Set(powerExpC)];
  const allD = [...polynomialD, ...powerExpD, ...gaussianD];
  return {
    termCoefficients,
    termIndex,
    minIntegerExponent,
    integerExponentCount: maxIntegerExponent - minIntegerExponent + 1,
    groupCount: groups.size,
    polynomialD: Float64Array.from(polynomialD),
    powerExpD: Float64Array.from(powerExpD),
    powerExpC: Int32Array.from(powerExpC),
    cValues: Int32Array.from(cValues),
    gaussianD: Float64Array.from(gaussianD),
    gaussianBell: Int32Array.from(gaussianBell),
    bells: Float64Array.from(bellKeys.flatMap((key) => key.split('|').map(Number))),
    maxPower: Math.max(1, ...allD, ...cValues),
  };
}
