import { MAX_TEMPERATURE_K, MID_TEMPERATURE_K, MIN_TEMPERATURE_K } from './constants';
import { ThermoRangeError } from './errors';
import type { GasModel } from './gas-model';

// Hot path: no allocation, one range test, one Horner evaluation per property.
// Module-local copies: under CommonJS transpilation (tsx scripts) every use of an imported constant is a
// getter call, which costs more than the polynomial itself.
const T_MIN = MIN_TEMPERATURE_K;
const T_MAX = MAX_TEMPERATURE_K;
const T_MID = MID_TEMPERATURE_K;

function checkRange(temperatureK: number): void {
  // Written so that NaN also fails.
  if (!(temperatureK >= T_MIN && temperatureK <= T_MAX)) {
    throw new ThermoRangeError(temperatureK);
  }
}

/** Isobaric specific heat, J/(kg K). */
export function cpMass(gas: GasModel, temperatureK: number): number {
  checkRange(temperatureK);
  const p = temperatureK < T_MID ? gas.low : gas.high;
  const t = temperatureK;
  return p.c0 + t * (p.c1 + t * (p.c2 + t * (p.c3 + t * p.c4)));
}

/** Isochoric specific heat cv = cp - R, J/(kg K). */
export function cvMass(gas: GasModel, temperatureK: number): number {
  return cpMass(gas, temperatureK) - gas.gasConstantJPerKgK;
}

/** Ratio of specific heats k = cp/cv. */
export function heatCapacityRatio(gas: GasModel, temperatureK: number): number {
  const cp = cpMass(gas, temperatureK);
  return cp / (cp - gas.gasConstantJPerKgK);
}

/** Specific enthalpy on the NASA reference (includes the enthalpy of formation), J/kg. */
export function enthalpyMass(gas: GasModel, temperatureK: number): number {
  checkRange(temperatureK);
  const p = temperatureK < T_MID ? gas.low : gas.high;
  const t = temperatureK;
  return p.h6 + t * (p.h1 + t * (p.h2 + t * (p.h3 + t * (p.h4 + t * p.h5))));
}

/**
 * Standard-state entropy s°(T) at 1 bar, J/(kg K): the mole-weighted species values without the mixing
 * term, which cancels for any change at fixed composition.
 */
export function standardEntropyMass(gas: GasModel, temperatureK: number): number {
  checkRange(temperatureK);
  const p = temperatureK < T_MID ? gas.low : gas.high;
  const t = temperatureK;
  return p.c0 * Math.log(t) + p.s7 + t * (p.s2 + t * (p.s3 + t * (p.s4 + t * p.s5)));
}

/** Molar cp, J/(mol K). */
export function cpMolar(gas: GasModel, temperatureK: number): number {
  return (cpMass(gas, temperatureK) * gas.molarMassKgPerKmol) / 1000;
}

/** Molar enthalpy, J/mol. */
export function enthalpyMolar(gas: GasModel, temperatureK: number): number {
  return (enthalpyMass(gas, temperatureK) * gas.molarMassKgPerKmol) / 1000;
}

/** Molar standard-state entropy, J/(mol K). */
export function standardEntropyMolar(gas: GasModel, temperatureK: number): number {
  return (standardEntropyMass(gas, temperatureK) * gas.molarMassKgPerKmol) / 1000;
}

/** Ideal-gas density, kg/m3. */
export function densityKgPerM3(gas: GasModel, temperatureK: number, pressurePa: number): number {
  return pressurePa / (gas.gasConstantJPerKgK * temperatureK);
}
