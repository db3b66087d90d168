import { CRITICAL_CONSTANTS, type CriticalConstants } from '../../critical-constants';
import { interactionParameter } from './binary-interaction';
import { OMEGA_A, OMEGA_B, R, kappaOf } from './constants';
import { EosInputError } from './errors';

/** Options shared by every Peng-Robinson build. */
export type PengRobinsonOptions = {
  /** Critical constants by species id, used before (or instead of) the engine's CRITICAL_CONSTANTS table. */
  readonly criticalConstants?: Readonly<Record<string, CriticalConstants>>;
  /** k_ij overrides, keyed "A|B" (either order); any pair not given comes from the published table. */
  readonly interactionParameters?: Readonly<Record<string, number>>;
};

const ENGINE_CONSTANTS = CRITICAL_CONSTANTS as Readonly<Record<string, CriticalConstants | undefined>>;

/** Critical constants of one species: the options first, then the engine's table; throws for an unknown id. */
export function criticalConstantsOf(id: string, options?: PengRobinsonOptions): CriticalConstants {
  const c = options?.criticalConstants?.[id] ?? ENGINE_CONSTANTS[id];
  if (!c) {
    throw new EosInputError(
      `components.${id}`,
      `no critical constants for species "${id}"; Peng-Robinson needs Tc, pc and ω`,
    );
  }
  return c;
}

function kij(a: string, b: string, options?: PengRobinsonOptions): number {
  const override = options?.interactionParameters?.[`${a}|${b}`] ?? options?.interactionParameters?.[`${b}|${a}`];
  return override ?? interactionParameter(a, b);
}

/**
 * The pure-component parameters and k_ij matrix of a set of species, plus a per-temperature cache of
 * a_i(T) and a_ij(T) = sqrt(a_i a_j)(1 - k_ij). Compositions are plain arrays in the order of `ids`.
 * Build once per species set (see `componentsFor`); not shared between threads.
 */
export class PengRobinsonComponents {
  readonly ids: readonly string[];
  readonly n: number;
  readonly tcK: Float64Array;
  readonly pcPa: Float64Array;
  readonly omega: Float64Array;
  readonly kappa: Float64Array;
  /** Co-volume b_i, m3/mol. */
  readonly b: Float64Array;
  /** sqrt(Tc), sqrt(K). */
  readonly sqrtTc: Float64Array;
  /** sqrt(Ωa R² Tc² / pc), sqrt(Pa m6/mol²). */
  readonly sqrtAc: Float64Array;
  /** 1 - k_ij, row-major n × n. */
  readonly oneMinusK: Float64Array;

  /** Temperature of the cached values below. */
  private cachedT = NaN;
  /** |1 + κ (1 - sqrt(T/Tc))| and its first and second temperature derivatives. */
  readonly m: Float64Array;
  readonly dm: Float64Array;
  readonly d2m: Float64Array;
  /** a_i(T), Pa m6/mol². */
  readonly a: Float64Array;
  /** a_ij(T), row-major. */
  readonly aij: Float64Array;
  /** Scratch for Σ_j x_j a_ij, reused by the fugacity code. */
  readonly sumA: Float64Array;

  constructor(ids: readonly string[], options?: PengRobinsonOptions) {
    const n = ids.length;
    this.ids = ids;
    this.n = n;
    this.tcK = new Float64Array(n);
    this.pcPa = new Float64Array(n);
    this.omega = new Float64Array(n);
    this.kappa = new Float64Array(n);
    this.b = new Float64Array(n);
    this.sqrtAc = new Float64Array(n);
    this.sqrtTc = new Float64Array(n);
    this.oneMinusK = new Float64Array(n * n);
    this.m = new Float64Array(n);
    this.dm = new Float64Array(n);
    this.d2m = new Float64Array(n);
    this.a = new Float64Array(n);
    this.aij = new Float64Array(n * n);
    this.sumA = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const c = criticalConstantsOf(ids[i]!, options);
      const pc = c.pcBar * 1e5;
      this.tcK[i] = c.tcK;
      this.sqrtTc[i] = Math.sqrt(c.tcK);
      this.pcPa[i] = pc;
      this.omega[i] = c.omega;
      this.kappa[i] = kappaOf(c.omega);
      this.b[i] = (OMEGA_B * R * c.tcK) / pc;
      this.sqrtAc[i] = Math.sqrt((OMEGA_A * R * R * c.tcK * c.tcK) / pc);
      for (let j = 0; j < n; j++) this.oneMinusK[i * n + j] = 1 - kij(ids[i]!, ids[j]!, options);
    }
  }

  /** Fills m, dm, d2m, a and aij for temperature T (no work when T is the cached one). */
  setTemperature(T: number): void {
    if (T === this.cachedT) return;
    const n = this.n;
    const sqrtT = Math.sqrt(T);
    for (let i = 0; i < n; i++) {
      const k = this.kappa[i]!;
      const sqrtTc = this.sqrtTc[i]!;
      let m = 1 + k * (1 - sqrtT / sqrtTc);
      let dm = -k / (2 * sqrtT * sqrtTc);
      let d2m = k / (4 * T * sqrtT * sqrtTc);
      // sqrt(α) = |m|: past the temperature where m crosses zero (far above Tc, e.g. 1390 K for N2) the
      // literal sqrt(a_i a_j) keeps its sign positive.
      if (m < 0) {
        m = -m;
        dm = -dm;
        d2m = -d2m;
      }
      this.m[i] = m;
      this.dm[i] = dm;
      this.d2m[i] = d2m;
      const s = this.sqrtAc[i]! * m;
      this.a[i] = s * s;
    }
    for (let i = 0; i < n; i++) {
      const si = this.sqrtAc[i]! * this.m[i]!;
      for (let j = i; j < n; j++) {
        const v = si * this.sqrtAc[j]! * this.m[j]! * this.oneMinusK[i * n + j]!;
        this.aij[i * n + j] = v;
        this.aij[j * n + i] = v;
      }
    }
    this.cachedT = T;
  }
}

const CACHE = new Map<string, PengRobinsonComponents>();
const CACHE_BY_OPTIONS = new WeakMap<PengRobinsonOptions, Map<string, PengRobinsonComponents>>();
const CACHE_LIMIT = 64;

/**
 * A component set for these ids, cached per options object (and once for no options), so repeated calls for the
 * same gas cost one map look-up.
 */
export function componentsFor(ids: readonly string[], options?: PengRobinsonOptions): PengRobinsonComponents {
  let cache = CACHE;
  if (options) {
    cache = CACHE_BY_OPTIONS.get(options) ?? new Map();
    CACHE_BY_OPTIONS.set(options, cache);
  }
  const key = ids.join(',');
  let c = cache.get(key);
  if (!c) {
    if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value!);
    c = new PengRobinsonComponents(ids, options);
    cache.set(key, c);
  }
  return c;
}
