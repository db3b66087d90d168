/*
 * The contract between an equation of state and the property layer that turns it into Z, h, s, cp, cv,
 * speed of sound and the flashes the sizing engine needs.
 *
 * An equation of state here is split the way Helmholtz-energy equations are written
 * [pub: Span, Multiparameter Equations of State, Springer (2000), ch. 3]:
 *   a(T, rho) = a_ideal(T, rho) + a_residual(T, rho)
 * The ideal part depends on temperature only (plus the ideal-gas density term the property layer adds);
 * the residual part carries every real-gas effect. A cubic equation (Peng-Robinson) has an analytic
 * residual Helmholtz energy too, so both equations plug into the same property and flash code.
 *
 * Everything is molar and SI: T in K, rho in mol/m3, p in Pa, J/mol, J/(mol K).
 */

/** Which property model a sizing uses. */
export type EquationOfStateId = 'ideal-gas' | 'peng-robinson' | 'gerg-2008';

/**
 * Derivatives of the reduced residual Helmholtz energy A = a_r / (R T) of a mixture of fixed composition,
 * taken in temperature T and molar density rho and scaled to be dimensionless. For an equation written in
 * delta = rho/rho_r and tau = T_r/T (GERG-2008) at fixed composition:
 *   aD = delta alpha_delta, aDD = delta^2 alpha_delta_delta,
 *   aT = -tau alpha_tau, aTT = tau^2 alpha_tau_tau + 2 tau alpha_tau, aDT = -delta tau alpha_delta_tau.
 */
export type ResidualDerivatives = {
  /** A */
  a: number;
  /** rho dA/drho */
  aD: number;
  /** rho^2 d2A/drho2 */
  aDD: number;
  /** T dA/dT */
  aT: number;
  /** T^2 d2A/dT2 */
  aTT: number;
  /** rho T d2A/(drho dT) */
  aDT: number;
};

/** The residual part of an equation of state for one fixed composition; build once, evaluate often. */
export type ResidualModel = {
  /** Fills `out` at (T, rho) without allocating. */
  evaluate(temperatureK: number, densityMolPerM3: number, out: ResidualDerivatives): void;
  /**
   * A density from which Newton's method on p(T, rho) = p converges to the requested phase's root
   * (a cubic's own root, or an estimate); mol/m3.
   */
  densityGuess(temperatureK: number, pressurePa: number, phase: 'vapour' | 'liquid'): number;
  /** No physical state lies at or above this molar density (e.g. 1/b for a cubic); mol/m3. */
  readonly maxDensityMolPerM3: number;
};

/** The ideal-gas part of an equation of state, temperature only; molar basis. */
export type IdealGasModel = {
  /** Isobaric heat capacity of the ideal gas, J/(mol K). */
  cp0(temperatureK: number): number;
  /** Ideal-gas enthalpy, J/mol, on any fixed reference (only differences are used). */
  h0(temperatureK: number): number;
  /** Ideal-gas entropy at the standard pressure p0 = 100 kPa, J/(mol K), on any fixed reference. */
  s0(temperatureK: number): number;
};

/** An equation of state compiled for one composition. */
export type EquationOfState = {
  readonly id: Exclude<EquationOfStateId, 'ideal-gas'>;
  /** The molar gas constant the equation was fitted with, J/(mol K). */
  readonly gasConstantJPerMolK: number;
  readonly molarMassKgPerKmol: number;
  readonly ideal: IdealGasModel;
  readonly residual: ResidualModel;
};

/** A zeroed derivative record to fill in place. */
export function newResidualDerivatives(): ResidualDerivatives {
  return { a: 0, aD: 0, aDD: 0, aT: 0, aTT: 0, aDT: 0 };
}
