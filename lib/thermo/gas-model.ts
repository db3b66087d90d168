import { GAS_CONSTANT_J_PER_MOL_K, MAX_TEMPERATURE_K, MIN_TEMPERATURE_K } from './constants';
import { SPECIES, type NasaCoefficients, type SpeciesId } from './species-data';

/**
 * One temperature range of a mixture polynomial, already on a mass basis (J/kg, J/(kg K)) and with the
 * h and s° divisors folded in, so each property is a single Horner evaluation.
 */
export type RangePolynomial = {
  readonly c0: number;
  readonly c1: number;
  readonly c2: number;
  readonly c3: number;
  readonly c4: number;
  readonly h1: number;
  readonly h2: number;
  readonly h3: number;
  readonly h4: number;
  readonly h5: number;
  readonly h6: number;
  readonly s2: number;
  readonly s3: number;
  readonly s4: number;
  readonly s5: number;
  readonly s7: number;
};

/** A compiled ideal-gas mixture; build with `compileGas`, never by hand. */
export type GasModel = {
  readonly key: string;
  readonly label: string;
  readonly moleFractions: Readonly<Partial<Record<SpeciesId, number>>>;
  readonly molarMassKgPerKmol: number;
  readonly gasConstantJPerKgK: number;
  readonly low: RangePolynomial;
  readonly high: RangePolynomial;
  /** h and s° (mass basis) at the range ends, for bracketing inversions. */
  readonly hMinJPerKg: number;
  readonly hMaxJPerKg: number;
  readonly sMinJPerKgK: number;
  readonly sMaxJPerKgK: number;
};

function weightedCoefficients(moleFractions: Partial<Record<SpeciesId, number>>, range: 'low' | 'high'): number[] {
  const a = [0, 0, 0, 0, 0, 0, 0];
  for (const [id, x] of Object.entries(moleFractions) as [SpeciesId, number][]) {
    const coefficients: NasaCoefficients = SPECIES[id][range];
    for (let i = 0; i < 7; i++) a[i]! += x * coefficients[i]!;
  }
  return a;
}

function rangePolynomial(a: number[], rMass: number): RangePolynomial {
  const [a1, a2, a3, a4, a5, a6, a7] = a.map((v) => v * rMass) as [
    number,
    number,
    number,
    number,
    number,
    number,
    number,
  ];
  return {
    c0: a1,
    c1: a2,
    c2: a3,
    c3: a4,
    c4: a5,
    h1: a1,
    h2: a2 / 2,
    h3: a3 / 3,
    h4: a4 / 4,
    h5: a5 / 5,
    h6: a6,
    s2: a2,
    s3: a3 / 2,
    s4: a4 / 3,
    s5: a5 / 4,
    s7: a7,
  };
}

function enthalpyAt(p: RangePolynomial, t: number): number {
  return p.h6 + t * (p.h1 + t * (p.h2 + t * (p.h3 + t * (p.h4 + t * p.h5))));
}

function entropyAt(p: RangePolynomial, t: number): number {
  return p.c0 * Math.log(t) + p.s7 + t * (p.s2 + t * (p.s3 + t * (p.s4 + t * p.s5)));
}

/**
 * Builds the mixture polynomial once: mole-fraction sums of the species coefficients (all sets share
 * Tmid = 1000 K), divided by the mixture molar mass. Fractions must already be validated and sum to 1.
 */
export function compileGas(key: string, label: string, moleFractions: Partial<Record<SpeciesId, number>>): GasModel {
  let molarMass = 0;
  for (const [id, x] of Object.entries(moleFractions) as [SpeciesId, number][]) {
    molarMass += x * SPECIES[id].molarMassKgPerKmol;
  }
  const rMass = (GAS_CONSTANT_J_PER_MOL_K * 1000) / molarMass;
  const low = rangePolynomial(weightedCoefficients(moleFractions, 'low'), rMass);
  const high = rangePolynomial(weightedCoefficients(moleFractions, 'high'), rMass);
  return {
    key,
    label,
    moleFractions: Object.freeze({ ...moleFractions }),
    molarMassKgPerKmol: molarMass,
    gasConstantJPerKgK: rMass,
    low,
    high,
    hMinJPerKg: enthalpyAt(low, MIN_TEMPERATURE_K),
    hMaxJPerKg: enthalpyAt(high, MAX_TEMPERATURE_K),
    sMinJPerKgK: entropyAt(low, MIN_TEMPERATURE_K),
    sMaxJPerKgK: entropyAt(high, MAX_TEMPERATURE_K),
  };
}
