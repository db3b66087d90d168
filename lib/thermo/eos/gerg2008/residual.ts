import type { ResidualDerivatives } from '../types';
import type { MixtureTerms } from './terms';

/*
 * Evaluates the merged residual terms of one mixture (./terms.ts) and their derivatives, allocation-free.
 * For every term v = n delta^d tau^t f(delta), with D1 = delta d(ln v)/d(delta):
 *   delta alpha_delta = v D1, delta^2 alpha_delta_delta = v (D1^2 - d + delta^2 (ln f)''),
 *   tau alpha_tau = v t, tau^2 alpha_tau_tau = v t (t - 1), delta tau alpha_delta_tau = v t D1,
 * and the contract's temperature derivatives at fixed rho follow from tau = T_r / T:
 *   T dA/dT = -tau alpha_tau, T^2 d2A/dT2 = tau^2 alpha_tau_tau + 2 tau alpha_tau, rho T d2A/drho dT = -delta tau alpha_delta_tau.
 * Powers tau^t are computed once per distinct t (and kept while T does not change, as in a density
 * iteration), delta^d by multiplication, exp(-delta^c) once per distinct c and each Gaussian bell once per
 * distinct (eta, eps, beta, gamma).
 */

const POLY_STRIDE = 6; // n, n d, n d (d-1), n t, n t (t+1), n t d
const PEXP_STRIDE = 6; // n, d, t, t+1, c, c (c-1)
const GAUSS_STRIDE = 4; // n, d, t, t+1

export class ResidualEvaluator {
  private readonly tValues: Float64Array;
  private readonly tauPow: Float64Array;
  private readonly deltaPow: Float64Array;
  private readonly cValues: Int32Array;
  private readonly expNegDeltaC: Float64Array;
  private readonly poly: Float64Array;
  private readonly polyIndex: Int32Array; // d, t index
  private readonly pexp: Float64Array;
  private readonly pexpIndex: Int32Array; // d, t index, c
  private readonly gauss: Float64Array;
  private readonly gaussIndex: Int32Array; // d, t index, bell index
  private readonly bells: Float64Array; // eta, eps, beta, gamma
  private readonly bellValue: Float64Array; // exp(...), delta (ln f)', delta^2 (ln f)'' per bell
  private lastTemperature = Number.NaN;

  constructor(
    terms: MixtureTerms,
    private readonly reducingTemperatureK: number,
    private readonly reducingDensityMolPerM3: number,
  ) {
    const { polynomial, powerExponential, gaussian } = terms;
    const tList = [...new Set([...polynomial, ...powerExponential, ...gaussian].map((term) => term.t))];
    const tIndex = new Map(tList.map((t, i) => [t, i]));
    this.tValues = Float64Array.from(tList);
    this.tauPow = new Float64Array(tList.length);
    const maxD = Math.max(1, ...[...polynomial, ...powerExponential, ...gaussian].map((term) => term.d));
    const cList = [...new Set(powerExponential.map((term) => term.c))];
    const maxC = Math.max(1, ...cList);
    this.deltaPow = new Float64Array(Math.max(maxD, maxC) + 1);
    this.cValues = Int32Array.from(cList);
    this.expNegDeltaC = new Float64Array(maxC + 1);

    this.poly = new Float64Array(polynomial.length * POLY_STRIDE);
    this.polyIndex = new Int32Array(polynomial.length * 2);
    polynomial.forEach(({ n, d, t }, k) => {
      this.poly.set([n, n * d, n * d * (d - 1), n * t, n * t * (t + 1), n * t * d], k * POLY_STRIDE);
      this.polyIndex.set([d, tIndex.get(t)!], k * 2);
    });

    this.pexp = new Float64Array(powerExponential.length * PEXP_STRIDE);
    this.pexpIndex = new Int32Array(powerExponential.length * 3);
    powerExponential.forEach(({ n, d, t, c }, k) => {
      this.pexp.set([n, d, t, t + 1, c, c * (c - 1)], k * PEXP_STRIDE);
      this.pexpIndex.set([d, tIndex.get(t)!, c], k * 3);
    });

    const bellKeys = [...new Set(gaussian.map((g) => `${g.eta}|${g.eps}|${g.beta}|${g.gamma}`))];
    this.bells = Float64Array.from(bellKeys.flatMap((key) => key.split('|').map(Number)));
    this.bellValue = new Float64Array(bellKeys.length * 3);
    this.gauss = new Float64Array(gaussian.length * GAUSS_STRIDE);
    this.gaussIndex = new Int32Array(gaussian.length * 3);
    gaussian.forEach(({ n, d, t, eta, eps, beta, gamma }, k) => {
      this.gauss.set([n, d, t, t + 1], k * GAUSS_STRIDE);
      this.gaussIndex.set([d, tIndex.get(t)!, bellKeys.indexOf(`${eta}|${eps}|${beta}|${gamma}`)], k * 3);
    });
  }

  evaluate(temperatureK: number, densityMolPerM3: number, out: ResidualDerivatives): void {
    const delta = densityMolPerM3 / this.reducingDensityMolPerM3;
    if (temperatureK !== this.lastTemperature) {
      const lnTau = Math.log(this.reducingTemperatureK / temperatureK);
      const tValues = this.tValues;
      const tauPow = this.tauPow;
      for (let k = 0; k < tValues.length; k++) tauPow[k] = Math.exp(tValues[k]! * lnTau);
      this.lastTemperature = temperatureK;
    }
    const tauPow = this.tauPow;
    const dp = this.deltaPow;
    dp[0] = 1;
    for (let k = 1; k < dp.length; k++) dp[k] = dp[k - 1]! * delta;
    const cValues = this.cValues;
    const expC = this.expNegDeltaC;
    for (let k = 0; k < cValues.length; k++) expC[cValues[k]!] = Math.exp(-dp[cValues[k]!]!);

    let a = 0;
    let aD = 0;
    let aDD = 0;
    let tA = 0; // tau alpha_tau
    let tTT = 0; // tau^2 alpha_tau_tau + 2 tau alpha_tau
    let dtA = 0; // delta tau alpha_delta_tau

    const poly = this.poly;
    const polyIndex = this.polyIndex;
    for (let k = 0, m = 0; m < polyIndex.length; k += POLY_STRIDE, m += 2) {
      const v = dp[polyIndex[m]!]! * tauPow[polyIndex[m + 1]!]!;
      a += poly[k]! * v;
      aD += poly[k + 1]! * v;
      aDD += poly[k + 2]! * v;
      tA += poly[k + 3]! * v;
      tTT += poly[k + 4]! * v;
      dtA += poly[k + 5]! * v;
    }

    const pexp = this.pexp;
    const pexpIndex = this.pexpIndex;
    for (let k = 0, m = 0; m < pexpIndex.length; k += PEXP_STRIDE, m += 3) {
      const c = pexpIndex[m + 2]!;
      const v = pexp[k]! * dp[pexpIndex[m]!]! * tauPow[pexpIndex[m + 1]!]! * expC[c]!;
      const d = pexp[k + 1]!;
      const t = pexp[k + 2]!;
      const cdc = pexp[k + 4]! * dp[c]!;
      const d1 = d - cdc;
      a += v;
      aD += v * d1;
      aDD += v * (d1 * d1 - d - pexp[k + 5]! * dp[c]!);
      const vt = v * t;
      tA += vt;
      tTT += vt * pexp[k + 3]!;
      dtA += vt * d1;
    }

    const gauss = this.gauss;
    if (gauss.length > 0) {
      const bells = this.bells;
      const bellValue = this.bellValue;
      for (let b = 0, q = 0; q < bells.length; b += 3, q += 4) {
        const eta = bells[q]!;
        const dEps = delta - bells[q + 1]!;
        const beta = bells[q + 2]!;
        bellValue[b] = Math.exp(-eta * dEps * dEps - beta * (delta - bells[q + 3]!));
        bellValue[b + 1] = delta * (-2 * eta * dEps - beta);
        bellValue[b + 2] = -2 * eta * delta * delta;
      }
      const gaussIndex = this.gaussIndex;
      for (let k = 0, m = 0; m < gaussIndex.length; k += GAUSS_STRIDE, m += 3) {
        const b = gaussIndex[m + 2]! * 3;
        const v = gauss[k]! * dp[gaussIndex[m]!]! * tauPow[gaussIndex[m + 1]!]! * bellValue[b]!;
        const d = gauss[k + 1]!;
        const d1 = d + bellValue[b + 1]!;
        a += v;
        aD += v * d1;
        aDD += v * (d1 * d1 - d + bellValue[b + 2]!);
        const vt = v * gauss[k + 2]!;
        tA += vt;
        tTT += vt * gauss[k + 3]!;
        dtA += vt * d1;
      }
    }

    out.a = a;
    out.aD = aD;
    out.aDD = aDD;
    out.aT = -tA;
    out.aTT = tTT;
    out.aDT = -dtA;
  }
}
