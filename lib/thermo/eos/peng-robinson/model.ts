import type { EquationOfState, IdealGasModel, ResidualDerivatives, ResidualModel } from '../types';
import { attractionQuadratic, mixtureAttraction, type Attraction } from './attraction';
import type { PengRobinsonComponents, PengRobinsonOptions } from './components';
import { prepareComposition, type SpeciesFractions } from './composition';
import { R as GAS_R, SQRT2, DELTA_2 as D2 } from './constants';
import { newCubicRoots, solveCubic, type CubicRoots } from './cubic';
import { lnFugacityCoefficients as lnPhi, newFugacityState, type PhaseRoot } from './fugacity';
import { idealGasOf, molarMassOf } from './ideal-gas';

export type PengRobinsonBuildOptions = PengRobinsonOptions & {
  /** The ideal-gas part; by default the engine's NASA polynomials for the same composition. */
  readonly ideal?: IdealGasModel;
  /** Molar mass, kg/kmol; by default from the engine's species data. */
  readonly molarMassKgPerKmol?: number;
};

/** Peng-Robinson for one composition: the EquationOfState contract plus what the phase code needs. */
export type PengRobinsonEquation = EquationOfState & {
  readonly id: 'peng-robinson';
  /** Species present, in the order of every per-component array below. */
  readonly componentIds: readonly string[];
  /** Their mole fractions (normalised). */
  readonly moleFractions: Float64Array;
  readonly components: PengRobinsonComponents;
  /** Z roots of the cubic at (T, p); vapour = largest, liquid = smallest. Fills and returns `out`. */
  cubicRoots(temperatureK: number, pressurePa: number, out?: CubicRoots): CubicRoots;
  /** ln φ_i of this composition on the root of `phase`; returns the root's Z. */
  lnFugacityCoefficients(temperatureK: number, pressurePa: number, phase: PhaseRoot, out: Float64Array): number;
  /** a_i(T), Pa m6/mol², into `out`. */
  componentAttraction(temperatureK: number, out: Float64Array): Float64Array;
  /** b_i, m3/mol. */
  readonly componentCovolume: Float64Array;
  /** Mixture a(T) and its temperature derivatives. */
  attraction(temperatureK: number, out: Attraction): Attraction;
  /** Mixture co-volume b, m3/mol. */
  readonly covolume: number;
};

// Module-local copies (imported bindings are getters under tsx's CommonJS output, and evaluate is hot).
const R = GAS_R;
const DELTA_2 = D2;
const INV_2SQRT2 = 1 / (2 * SQRT2);
const TWO_SQRT2 = 2 * SQRT2;

/**
 * The residual Helmholtz energy of Peng-Robinson in T and rho at fixed composition, A = a_r/(R T) =
 *   -ln(1 - b rho) - a(T)/(2√2 b R T) ln[(1 + (1+√2) b rho)/(1 + (1-√2) b rho)]
 * and its derivatives, as defined in eos/types.ts. With η = b rho, D = 1 + 2η - η², G = ln[...]/(2√2),
 * Ψ = a/(b R T): rho dG/drho = η/D, so aD = η/(1-η) - Ψη/D, aDD = η²/(1-η)² + Ψ η²(2-2η)/D²,
 * aT = -(TΨ')G, aTT = -(T²Ψ'')G, aDT = -(TΨ')η/D, with TΨ' = (T a' - a)/(bRT), T²Ψ'' = (T²a'' - 2Ta' + 2a)/(bRT).
 */
class PengRobinsonResidual implements ResidualModel {
  readonly maxDensityMolPerM3: number;
  private lastT = NaN;
  private psi = 0;
  private psiT = 0;
  private psiTT = 0;
  private readonly roots = newCubicRoots();
  private readonly work: Attraction = { a: 0, dadT: 0, d2adT2: 0 };

  constructor(
    private readonly b: number,
    private readonly a0: number,
    private readonly a1: number,
    private readonly a2: number,
    private readonly quadraticLimitK: number,
    private readonly general: (T: number, out: Attraction) => void,
  ) {
    this.maxDensityMolPerM3 = 1 / b;
  }

  attraction(T: number, out: Attraction): Attraction {
    if (T < this.quadraticLimitK) {
      const s = Math.sqrt(T);
      out.a = this.a0 - 2 * this.a1 * s + this.a2 * T;
      out.dadT = this.a2 - this.a1 / s;
      out.d2adT2 = this.a1 / (2 * T * s);
    } else {
      this.general(T, out);
    }
    return out;
  }

  private setTemperature(T: number): void {
    const w = this.attraction(T, this.work);
    const bRT = this.b * R * T;
    this.psi = w.a / bRT;
    this.psiT = (T * w.dadT - w.a) / bRT;
    this.psiTT = (T * T * w.d2adT2 - 2 * T * w.dadT + 2 * w.a) / bRT;
    this.lastT = T;
  }

  evaluate(temperatureK: number, densityMolPerM3: number, out: ResidualDerivatives): void {
    if (temperatureK !== this.lastT) this.setTemperature(temperatureK);
    const eta = this.b * densityMolPerM3;
    const oneMinus = 1 - eta;
    const d = 1 + eta * (2 - eta);
    const g = Math.log1p((TWO_SQRT2 * eta) / (1 + DELTA_2 * eta)) * INV_2SQRT2;
    const etaOverD = eta / d;
    const r = eta / oneMinus;
    out.a = -Math.log1p(-eta) - this.psi * g;
    out.aD = r - this.psi * etaOverD;
    out.aDD = r * r + this.psi * etaOverD * etaOverD * (2 - 2 * eta);
    out.aT = -this.psiT * g;
    out.aTT = -this.psiTT * g;
    out.aDT = -this.psiT * etaOverD;
  }

  cubicRoots(T: number, p: number, out: CubicRoots): CubicRoots {
    const w = this.attraction(T, this.work);
    const RT = R * T;
    return solveCubic((w.a * p) / (RT * RT), (this.b * p) / RT, out);
  }

  densityGuess(temperatureK: number, pressurePa: number, phase: 'vapour' | 'liquid'): number {
    const r = this.cubicRoots(temperatureK, pressurePa, this.roots);
    const z = phase === 'vapour' ? r.zVapour : r.zLiquid;
    return pressurePa / (z * R * temperatureK);
  }
}

/**
 * Compiles Peng-Robinson for one composition (mole fractions by species id; species with x = 0 are dropped).
 * Everything composition-dependent is precomputed here; `residual.evaluate` then costs two log1p and a few
 * divisions, plus a square root when the temperature changes.
 */
export function compilePengRobinson(
  moleFractions: SpeciesFractions,
  options?: PengRobinsonBuildOptions,
): PengRobinsonEquation {
  const { sys, x } = prepareComposition(moleFractions, options);
  let b = 0;
  for (let i = 0; i < sys.n; i++) b += x[i]! * sys.b[i]!;
  const [a0, a1, a2, limit] = attractionQuadratic(sys, x);
  const general = (T: number, out: Attraction) => mixtureAttraction(sys, x, T, out);
  const residual = new PengRobinsonResidual(b, a0, a1, a2, limit, general);
  const fractions: Record<string, number> = {};
  sys.ids.forEach((id, i) => (fractions[id] = x[i]!));
  const ideal = options?.ideal ?? idealGasOf(fractions);
  const molarMass = options?.molarMassKgPerKmol ?? molarMassOf(fractions);
  const state = newFugacityState();
  return {
    id: 'peng-robinson',
    gasConstantJPerMolK: R,
    molarMassKgPerKmol: molarMass,
    ideal,
    residual,
    componentIds: sys.ids,
    moleFractions: x,
    components: sys,
    componentCovolume: sys.b,
    covolume: b,
    cubicRoots: (T, p, out) => residual.cubicRoots(T, p, out ?? newCubicRoots()),
    lnFugacityCoefficients(T, p, phase, out) {
      lnPhi(sys, T, p, x, phase, out, state);
      return state.z;
    },
    componentAttraction(T, out) {
      sys.setTemperature(T);
      out.set(sys.a);
      return out;
    },
    attraction: (T, out) => residual.attraction(T, out),
  };
}
