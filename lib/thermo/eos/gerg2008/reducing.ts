import { GERG_COMPONENTS, type GergComponentId } from './components';
import { binaryReducingParameters } from './data/binary-reducing-parameters';

/*
 * Reducing functions of GERG-2008 [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032-3091, Eqs. (7.9),
 * (7.11), (7.12)]:
 *   T_r = sum_i x_i^2 T_c,i
 *       + sum_{i<j} 2 x_i x_j beta_T,ij gamma_T,ij (x_i + x_j) / (beta_T,ij^2 x_i + x_j) (T_c,i T_c,j)^0.5
 *   1/rho_r = sum_i x_i^2 / rho_c,i
 *       + sum_{i<j} 2 x_i x_j beta_v,ij gamma_v,ij (x_i + x_j) / (beta_v,ij^2 x_i + x_j)
 *                    * (rho_c,i^(-1/3) + rho_c,j^(-1/3))^3 / 8
 * They depend on composition only, so a compiled model evaluates them once.
 */

export type ReducingValues = {
  readonly temperatureK: number;
  readonly densityMolPerM3: number;
};

/** T_r and rho_r of a mixture; `ids` and `x` are the components present and their mole fractions. */
export function reducingValues(ids: readonly GergComponentId[], x: readonly number[]): ReducingValues {
  let tr = 0;
  let vr = 0;
  for (let i = 0; i < ids.length; i++) {
    const ci = GERG_COMPONENTS[ids[i]!];
    const xi = x[i]!;
    const rhoCi = ci.criticalDensityMolPerDm3 * 1000;
    tr += xi * xi * ci.criticalTemperatureK;
    vr += (xi * xi) / rhoCi;
    for (let j = i + 1; j < ids.length; j++) {
      const cj = GERG_COMPONENTS[ids[j]!];
      const xj = x[j]!;
      const rhoCj = cj.criticalDensityMolPerDm3 * 1000;
      const { betaV, gammaV, betaT, gammaT } = binaryReducingParameters(ids[i]!, ids[j]!);
      const xx = 2 * xi * xj * (xi + xj);
      tr +=
        ((xx * betaT * gammaT) / (betaT * betaT * xi + xj)) *
        Math.sqrt(ci.criticalTemperatureK * cj.criticalTemperatureK);
      vr +=
        (((xx * betaV * gammaV) / (betaV * betaV * xi + xj)) * (Math.cbrt(1 / rhoCi) + Math.cbrt(1 / rhoCj)) ** 3) / 8;
    }
  }
  return { temperatureK: tr, densityMolPerM3: 1 / vr };
}
