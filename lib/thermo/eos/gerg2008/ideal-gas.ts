import type { IdealGasModel } from '../types';
import { GERG_GAS_CONSTANT, GERG_IDEAL_FIT_GAS_CONSTANT, type GergComponentId } from './components';
import { IDEAL_GAS_COEFFICIENTS } from './data/ideal-gas-coefficients';

/*
 * The ideal-gas part of GERG-2008 in dimensional form, summed by mole fraction. From the reduced Helmholtz
 * energy alpha0_oi = ln(delta_i) + R* / R [n1 + n2 tau_i + n3 ln tau_i + n4 ln|sinh(th4 tau_i)|
 *   - n5 ln cosh(th5 tau_i) + n6 ln|sinh(th6 tau_i)| - n7 ln cosh(th7 tau_i)]
 * [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032-3091, Eq. (7.2)], with theta in K and x = theta/T:
 *   cp0 = R + R* [n3 + sum_sinh n x^2/sinh^2 x + sum_cosh n x^2/cosh^2 x]
 *   h0  = R (T - T0) + R* [n2 + T0 + n3 T + sum_sinh n theta coth x - sum_cosh n theta tanh x]
 *   s0  = R ln(p_ref T / (p0 T0)) + R* [n3 (1 + ln T) - n1 + sum_sinh n (x coth x - ln sinh x)
 *                                        - sum_cosh n (x tanh x - ln cosh x)]
 * at p0 = 100 kPa. n1, n2 are NIST's constants that put h0 = 0 and s0 = 0 at T0 = 298.15 K and
 * p_ref = 101.325 kPa (./data/ideal-gas-coefficients.ts); h0 and s0 are those of NIST's check values.
 * The entropy of mixing is left out (fixed composition: it cancels in every difference the engine takes).
 * Hyperbolic functions are written with exp(-2x) so they neither overflow at low T nor lose digits.
 */

const T0 = 298.15;
const P_REF_OVER_P0 = 101.325 / 100;
const LN2 = Math.LN2;

export function compileIdealGas(ids: readonly GergComponentId[], x: readonly number[]): IdealGasModel {
  const R = GERG_GAS_CONSTANT;
  const rStar = GERG_IDEAL_FIT_GAS_CONSTANT;
  let n1 = 0;
  let n2 = 0;
  let n3 = 0;
  const sinhN: number[] = [];
  const sinhTheta: number[] = [];
  const coshN: number[] = [];
  const coshTheta: number[] = [];
  ids.forEach((id, i) => {
    const c = IDEAL_GAS_COEFFICIENTS[id];
    n1 += x[i]! * c.n1;
    n2 += x[i]! * c.n2;
    n3 += x[i]! * c.n3;
    c.theta.forEach((theta, k) => {
      if (theta <= 0) return;
      (k % 2 === 0 ? sinhN : coshN).push(x[i]! * c.n[k]!);
      (k % 2 === 0 ? sinhTheta : coshTheta).push(theta);
    });
  });
  const sN = Float64Array.from(sinhN);
  const sTh = Float64Array.from(sinhTheta);
  const cN = Float64Array.from(coshN);
  const cTh = Float64Array.from(coshTheta);

  return {
    cp0(temperatureK: number): number {
      let sum = n3;
      for (let k = 0; k < sN.length; k++) {
        const y = sTh[k]! / temperatureK;
        const e = Math.exp(-y);
        const q = (2 * y * e) / (1 - e * e); // x / sinh x
        sum += sN[k]! * q * q;
      }
      for (let k = 0; k < cN.length; k++) {
        const y = cTh[k]! / temperatureK;
        const e = Math.exp(-y);
        const q = (2 * y * e) / (1 + e * e); // x / cosh x
        sum += cN[k]! * q * q;
      }
      return R + rStar * sum;
    },
    h0(temperatureK: number): number {
      let sum = n2 + T0 + n3 * temperatureK;
      for (let k = 0; k < sN.length; k++) {
        const e2 = Math.exp((-2 * sTh[k]!) / temperatureK);
        sum += (sN[k]! * sTh[k]! * (1 + e2)) / (1 - e2);
      }
      for (let k = 0; k < cN.length; k++) {
        const e2 = Math.exp((-2 * cTh[k]!) / temperatureK);
        sum -= (cN[k]! * cTh[k]! * (1 - e2)) / (1 + e2);
      }
      return R * (temperatureK - T0) + rStar * sum;
    },
    s0(temperatureK: number): number {
      let sum = n3 * (1 + Math.log(temperatureK)) - n1;
      for (let k = 0; k < sN.length; k++) {
        const y = sTh[k]! / temperatureK;
        const e2 = Math.exp(-2 * y);
        sum += sN[k]! * ((y * (1 + e2)) / (1 - e2) - (y + Math.log1p(-e2) - LN2));
      }
      for (let k = 0; k < cN.length; k++) {
        const y = cTh[k]! / temperatureK;
        const e2 = Math.exp(-2 * y);
        sum -= cN[k]! * ((y * (1 - e2)) / (1 + e2) - (y + Math.log1p(e2) - LN2));
      }
      return R * Math.log((P_REF_OVER_P0 * temperatureK) / T0) + rStar * sum;
    },
  };
}
