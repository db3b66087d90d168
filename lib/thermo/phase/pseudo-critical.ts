import { mixtureAttraction, OMEGA_A, OMEGA_B, type PengRobinsonComponents } from '../eos/peng-robinson';
import { R } from '../eos/peng-robinson/constants';

/**
 * The critical point of the one-fluid mixture, i.e. of a pure Peng-Robinson fluid with the mixture's a(T) and b:
 * a(T)/(b R T) = Ωa/Ωb fixes T, then p = Ωb R T / b. For a pure fluid this is exactly (Tc, pc); for a mixture it is
 * a pseudo-critical point (not the true mixture critical point), used only to tell a liquid from a dense gas
 * outside the two-phase region. a/T falls with T, so bisection on ln T brackets the single root.
 */
export function pseudoCritical(
  sys: PengRobinsonComponents,
  z: ArrayLike<number>,
): { temperatureK: number; pressurePa: number } {
  let b = 0;
  for (let i = 0; i < sys.n; i++) b += z[i]! * sys.b[i]!;
  const target = OMEGA_A / OMEGA_B;
  const work = { a: 0, dadT: 0, d2adT2: 0 };
  let lo = 1;
  let hi = 5000;
  for (let k = 0; k < 60; k++) {
    const T = Math.sqrt(lo * hi);
    mixtureAttraction(sys, z, T, work);
    if (work.a / (b * R * T) > target) lo = T;
    else hi = T;
  }
  const T = Math.sqrt(lo * hi);
  return { temperatureK: T, pressurePa: (OMEGA_B * R * T) / b };
}
