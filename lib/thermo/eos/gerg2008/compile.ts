import { FRACTION_SUM_TOLERANCE } from '../../composition';
import { MixtureError } from '../../errors';
import type { EquationOfState, ResidualDerivatives, ResidualModel } from '../types';
import { GERG_COMPONENT_IDS, GERG_COMPONENTS, GERG_GAS_CONSTANT, type GergComponentId } from './components';
import { makeDensityGuess } from './density-guess';
import { compileIdealGas } from './ideal-gas';
import { reducingValues } from './reducing';
import { ResidualEvaluator } from './residual';
import { layoutTerms } from './residual-layout';
import { collectTerms } from './terms';

/*
 * GERG-2008 compiled for one composition [pub: Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032-3091;
 * ISO 20765-2:2015; AGA Report No. 8 Part 2 (2017)]. Only components with x > 0 are kept; the reducing
 * values, the merged term lists and their constant factors are computed here once, so `evaluate` is a
 * flat, allocation-free loop. GERG-2008 is validated for 90-450 K up to 35 MPa (normal range) and
 * 60-700 K up to 70 MPa (extended range); outside that it extrapolates.
 */

export type GergMoleFractions = Readonly<Partial<Record<GergComponentId, number>>>;

const KNOWN: ReadonlySet<string> = new Set(GERG_COMPONENT_IDS);
const DENSITY_BOUND_FACTOR = 4;

export function compileGerg2008(moleFractions: GergMoleFractions): EquationOfState {
  const { ids, x } = checkMoleFractions(moleFractions);
  const reducing = reducingValues(ids, x);
  const evaluator = new ResidualEvaluator(
    layoutTerms(collectTerms(ids, x)),
    reducing.temperatureK,
    reducing.densityMolPerM3,
  );
  const evaluate = (temperatureK: number, densityMolPerM3: number, out: ResidualDerivatives) =>
    evaluator.evaluate(temperatureK, densityMolPerM3, out);

  // No fluid in GERG-2008's range is denser than about 3.4 rho_c (propane and the butanes at their triple
  // points [mem]); 4x the larger of rho_r and the ideal-mixing critical density bounds every mixture.
  let criticalVolume = 0;
  let molarMass = 0;
  ids.forEach((id, i) => {
    criticalVolume += x[i]! / (GERG_COMPONENTS[id].criticalDensityMolPerDm3 * 1000);
    molarMass += x[i]! * GERG_COMPONENTS[id].molarMass;
  });
  const residual: ResidualModel = {
    evaluate,
    densityGuess: makeDensityGuess(evaluate, GERG_GAS_CONSTANT, reducing.temperatureK, reducing.densityMolPerM3),
    maxDensityMolPerM3: DENSITY_BOUND_FACTOR * Math.max(reducing.densityMolPerM3, 1 / criticalVolume),
  };
  return {
    id: 'gerg-2008',
    gasConstantJPerMolK: GERG_GAS_CONSTANT,
    molarMassKgPerKmol: molarMass,
    ideal: compileIdealGas(ids, x),
    residual,
  };
}

/** Keeps the components with x > 0, in GERG order, normalised to sum exactly to 1. */
function checkMoleFractions(moleFractions: GergMoleFractions): { ids: GergComponentId[]; x: number[] } {
  let sum = 0;
  for (const [key, value] of Object.entries(moleFractions)) {
    if (!KNOWN.has(key)) {
      throw new MixtureError(key, `GERG-2008 has no component "${key}"; it covers ${GERG_COMPONENT_IDS.join(', ')}`);
    }
    if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > 1) {
      throw new MixtureError(key, `mole fraction of ${key} must be a number from 0 to 1 (got ${String(value)})`);
    }
    sum += value;
  }
  if (!(sum > 0)) throw new MixtureError('', 'give at least one GERG-2008 component with a mole fraction above 0');
  if (Math.abs(sum - 1) > FRACTION_SUM_TOLERANCE) {
    throw new MixtureError(
      '',
      `mole fractions sum to ${Number(sum.toPrecision(6))}; they must sum to 1 within ${FRACTION_SUM_TOLERANCE}`,
    );
  }
  const ids = GERG_COMPONENT_IDS.filter((id) => (moleFractions[id] ?? 0) > 0);
  return { ids, x: ids.map((id) => moleFractions[id]! / sum) };
}
