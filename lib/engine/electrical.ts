/** Continuous-load factor for conductors and overcurrent protection [mem: NEC 424.4(B) (2023); Art. 425 for industrial process heating]. */
export const CONTINUOUS_LOAD_FACTOR = 1.25;

/** Resistance heating loads above this current are subdivided [mem: NEC 424.22(B), 425.22]. */
export const SUBDIVISION_LIMIT_A = 48;

/** Default heater supply: 400 V three-phase (IEC 60038 nominal LV) [cp]. */
export const DEFAULT_SUPPLY = { voltageV: 400, phases: 3 } as const;

/**
 * Line current, A, of a balanced load: three-phase I = P / (√3 V_LL pf), single-phase I = P / (V pf).
 * Resistive heaters have pf = 1.
 */
export function lineCurrentA(powerKw: number, voltageV: number, phases: 1 | 3, powerFactor = 1): number {
  const va = (powerKw * 1000) / powerFactor;
  return phases === 3 ? va / (Math.sqrt(3) * voltageV) : va / voltageV;
}

/** Current for conductor and protection sizing of a continuous load (125 %). */
export function continuousCurrentA(currentA: number): number {
  return currentA * CONTINUOUS_LOAD_FACTOR;
}
