import { W_PER_HP } from '../units/factors';

// Imports used per call, re-bound to module constants once: under tsx's CommonJS output every use of an
// imported binding is a getter call, which shows on these hot paths (tests/bench/engine.bench.mts).
const WATTS_PER_HP = W_PER_HP;

/**
 * IEC 60072-1 standard output ratings to 1000 kW [mem]; above that, large machines are built to the R20
 * preferred numbers (ISO 3) that makers' ranges follow: 1120 ... 10 000 kW [mem: ISO 3 R20 series].
 */
export const IEC_MOTOR_RATINGS_KW: readonly number[] = [
  0.06, 0.09, 0.12, 0.18, 0.25, 0.37, 0.55, 0.75, 1.1, 1.5, 2.2, 3, 4, 5.5, 7.5, 11, 15, 18.5, 22, 30, 37, 45, 55, 75,
  90, 110, 132, 160, 200, 250, 315, 355, 400, 450, 500, 560, 630, 710, 800, 900, 1000, 1120, 1250, 1400, 1600, 1800,
  2000, 2240, 2500, 2800, 3150, 3550, 4000, 4500, 5000, 5600, 6300, 7100, 8000, 9000, 10000,
];

/**
 * NEMA MG 1 standard horsepower ratings: Part 10 to 500 hp and Part 20 (large machines) above it, to
 * 10 000 hp [mem: NEMA MG 1, Parts 10 and 20].
 */
export const NEMA_MOTOR_RATINGS_HP: readonly number[] = [
  1, 1.5, 2, 3, 5, 7.5, 10, 15, 20, 25, 30, 40, 50, 60, 75, 100, 125, 150, 200, 250, 300, 350, 400, 450, 500, 600, 700,
  800, 900, 1000, 1250, 1500, 1750, 2000, 2250, 2500, 3000, 3500, 4000, 4500, 5000, 5500, 6000, 7000, 8000, 9000, 10000,
];

/** Minimum margin of the motor rating over shaft power [mem: API machinery standards]; no service factor used. */
export const MOTOR_MARGIN_PERCENT = 10;

function nextAtLeast(series: readonly number[], needed: number): number | null {
  // Tolerance so that exactly 10 % (e.g. 100 kW on a 110 kW motor) counts as meeting the margin.
  for (const rating of series) if (rating >= needed * (1 - 1e-9)) return rating;
  return null;
}

/** Next IEC kW and NEMA hp ratings at least 10 % above the shaft power; null above the series. */
export function selectMotor(shaftPowerKw: number) {
  const factor = 1 + MOTOR_MARGIN_PERCENT / 100;
  const shaftHp = (shaftPowerKw * 1000) / WATTS_PER_HP;
  const iecKw = nextAtLeast(IEC_MOTOR_RATINGS_KW, shaftPowerKw * factor);
  const nemaHp = nextAtLeast(NEMA_MOTOR_RATINGS_HP, shaftHp * factor);
  return {
    iecKw,
    nemaHp,
    requiredMarginPercent: MOTOR_MARGIN_PERCENT,
    marginPercent: iecKw === null ? null : (iecKw / shaftPowerKw - 1) * 100,
    nemaMarginPercent: nemaHp === null ? null : (nemaHp / shaftHp - 1) * 100,
  };
}
