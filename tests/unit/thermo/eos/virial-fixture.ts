import type { EquationOfState } from '@/lib/thermo/eos/types';

/**
 * A test gas with a second virial coefficient B(T) = b - a/(RT) (the low-density limit of van der Waals),
 * so A = a_r/(RT) = B rho and every derivative is known in closed form. Constants of nitrogen-like size;
 * ideal part: constant cp0 = 3.5 R. Used only to check the property layer's algebra and solvers.
 */
export function virialGas(a = 0.137, b = 3.87e-5): EquationOfState {
  const r = 8.314462618;
  return {
    id: 'peng-robinson',
    gasConstantJPerMolK: r,
    molarMassKgPerKmol: 28.0134,
    ideal: { cp0: () => 3.5 * r, h0: (t) => 3.5 * r * t, s0: (t) => 3.5 * r * Math.log(t / 298.15) },
    residual: {
      evaluate(t, rho, out) {
        const bT = b - a / (r * t);
        const dB = a / (r * t * t);
        out.a = bT * rho;
        out.aD = bT * rho;
        out.aDD = 0;
        out.aT = t * dB * rho;
        out.aTT = t * t * ((-2 * a) / (r * t * t * t)) * rho;
        out.aDT = t * dB * rho;
      },
      densityGuess: (t, p) => p / (r * t),
      maxDensityMolPerM3: 1 / b,
    },
  };
}
