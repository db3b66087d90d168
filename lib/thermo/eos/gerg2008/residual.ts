import type { ResidualDerivatives } from '../types';
import { EXPONENT_STEPS, type ResidualLayout } from './residual-layout';

/*
 * Evaluates a mixture's residual Helmholtz energy A = alpha^r(delta, tau) and its derivatives,
 * allocation-free, from the grouped layout of ./residual-layout.ts. For a term v = n delta^d tau^t g(delta)
 * with D1 = delta d(ln v)/d(delta):
 *   delta alpha_delta = v D1,   delta^2 alpha_delta_delta = v (D1^2 - d + delta^2 (ln g)''),
 *   tau alpha_tau = v t,   tau^2 alpha_tau_tau = v t (t - 1),   delta tau alpha_delta_tau = v t D1,
 * with g = exp(-delta^c): D1 = d - c delta^c, delta^2 (ln g)'' = -c (c - 1) delta^c;
 * with g = exp(-eta (delta - eps)^2 - beta (delta - gamma)): D1 = d - delta (2 eta (delta - eps) + beta),
 *   delta^2 (ln g)'' = -2 eta delta^2.
 * The contract's derivatives at fixed rho follow from tau = T_r / T:
 *   T dA/dT = -tau alpha_tau, T^2 d2A/dT2 = tau^2 alpha_tau_tau + 2 tau alpha_tau = sum v t (t + 1),
 *   rho T d2A/(drho dT) = -delta tau alpha_delta_tau.
 * The temperature sums of each group are kept while T does not change (as in a density iteration).
 */

export class ResidualEvaluator {
  private readonly integerPow: Float64Array;
  private readonly fractionPow: Float64Array;
  private readonly sums: Float64Array; // S0, S1, S2 per group
  private readonly deltaPow: Float64Array;
  private readonly expNegDeltaC: Float64Array;
  private readonly bellValue: Float64Array; // per bell: g, delta (ln g)', delta^2 (ln g)''
  private lastTemperature = Number.NaN;

  constructor(
    private readonly layout: ResidualLayout,
    private readonly reducingTemperatureK: number,
    private readonly reducingDensityMolPerM3: number,
  ) {
    this.integerPow = new Float64Array(layout.integerExponentCount);
    this.fractionPow = new Float64Array(EXPONENT_STEPS);
    this.sums = new Float64Array(layout.groupCount * 3);
    this.deltaPow = new Float64Array(layout.maxPower + 1);
    this.expNegDeltaC = new Float64Array(layout.maxPower + 1);
    this.bellValue = new Float64Array((layout.bells.length / 4) * 3);
  }

  private updateTemperatureSums(temperatureK: number): void {
    const L = this.layout;
    const tau = this.reducingTemperatureK / temperatureK;
    const fractionPow = this.fractionPow; // tau^(m/40), m = 0..39
    const step = Math.exp(Math.log(tau) / EXPONENT_STEPS);
    fractionPow[0] = 1;
    for (let m = 1; m < EXPONENT_STEPS; m++) fractionPow[m] = fractionPow[m - 1]! * step;
    const integerPow = this.integerPow;
    integerPow[0] = L.minIntegerExponent === 0 ? 1 : Math.pow(tau, L.minIntegerExponent);
    for (let j = 1; j < integerPow.length; j++) integerPow[j] = integerPow[j - 1]! * tau;

    const sums = this.sums;
    sums.fill(0);
    const coefficients = L.termCoefficients;
    const index = L.termIndex;
    for (let k = 0; k < index.length; k += 3) {
      const power = integerPow[index[k + 1]!]! * fractionPow[index[k + 2]!]!;
      const s = index[k]! * 3;
      sums[s] = sums[s]! + coefficients[k]! * power;
      sums[s + 1] = sums[s + 1]! + coefficients[k + 1]! * power;
      sums[s + 2] = sums[s + 2]! + coefficients[k + 2]! * power;
    }
    this.lastTemperature = temperatureK;
  }

  evaluate(temperatureK: number, densityMolPerM3: number, out: ResidualDerivatives): void {
    if (temperatureK !== this.lastTemperature) this.updateTemperatureSums(temperatureK);
    const L = this.layout;
    const sums = this.sums;
    const delta = densityMolPerM3 / this.reducingDensityMolPerM3;
    const dp = this.deltaPow;
    dp[0] = 1;
    for (let k = 1; k < dp.length; k++) dp[k] = dp[k - 1]! * delta;

    let a = 0; // alpha
    let aD = 0; // delta alpha_delta
    let aDD = 0; // delta^2 alpha_delta_delta
    let tA = 0; // tau alpha_tau
    let tTT = 0; // tau^2 alpha_tau_tau + 2 tau alpha_tau
    let dtA = 0; // delta tau alpha_delta_tau
    let s = 0;

    const polynomialD = L.polynomialD;
    for (let g = 0; g < polynomialD.length; g++, s += 3) {
      const d = polynomialD[g]!;
      const v = dp[d]! * sums[s]!;
      const vt = dp[d]! * sums[s + 1]!;
      a += v;
      aD += v * d;
      aDD += v * d * (d - 1);
      tA += vt;
      tTT += dp[d]! * sums[s + 2]!;
      dtA += vt * d;
    }

    const cValues = L.cValues;
    const expC = this.expNegDeltaC;
    for (let j = 0; j < cValues.length; j++) expC[cValues[j]!] = Math.exp(-dp[cValues[j]!]!);
    const powerExpD = L.powerExpD;
    const powerExpC = L.powerExpC;
    for (let g = 0; g < powerExpD.length; g++, s += 3) {
      const d = powerExpD[g]!;
      const c = powerExpC[g]!;
      const factor = dp[d]! * expC[c]!;
      const cdc = c * dp[c]!;
      const d1 = d - cdc;
      const v = factor * sums[s]!;
      const vt = factor * sums[s + 1]!;
      a += v;
      aD += v * d1;
      aDD += v * (d1 * d1 - d - (c - 1) * cdc);
      tA += vt;
      tTT += factor * sums[s + 2]!;
      dtA += vt * d1;
    }

    const gaussianD = L.gaussianD;
    if (gaussianD.length > 0) {
      const bells = L.bells;
      const bellValue = this.bellValue;
      for (let b = 0, q = 0; q < bells.length; b += 3, q += 4) {
        const eta = bells[q]!;
        const offset = delta - bells[q + 1]!;
        const beta = bells[q + 2]!;
        bellValue[b] = Math.exp(-eta * offset * offset - beta * (delta - bells[q + 3]!));
        bellValue[b + 1] = -delta * (2 * eta * offset + beta);
        bellValue[b + 2] = -2 * eta * delta * delta;
      }
      const gaussianBell = L.gaussianBell;
      for (let g = 0; g < gaussianD.length; g++, s += 3) {
        const d = gaussianD[g]!;
        const b = gaussianBell[g]! * 3;
        const factor = dp[d]! * bellValue[b]!;
        const d1 = d + bellValue[b + 1]!;
        const v = factor * sums[s]!;
        const vt = factor * sums[s + 1]!;
        a += v;
        aD += v * d1;
        aDD += v * (d1 * d1 - d + bellValue[b + 2]!);
        tA += vt;
        tTT += factor * sums[s + 2]!;
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
