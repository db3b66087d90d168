import { W_PER_BTU_PER_H, W_PER_HP, W_PER_KW, W_PER_MW } from './factors';
import { UnitError } from './unit-error';
import type { PowerUnit } from './unit-strings';

const W_PER_UNIT: Readonly<Record<PowerUnit, number>> = {
  W: 1,
  kW: W_PER_KW,
  MW: W_PER_MW,
  hp: W_PER_HP,
  'Btu/h': W_PER_BTU_PER_H,
};

function factorOf(unit: string): number {
  const factor = W_PER_UNIT[unit as PowerUnit];
  if (factor === undefined) throw new UnitError(`unknown power unit "${unit}"`);
  return factor;
}

/** Power in watts from kW, W, MW, hp (mechanical, 550 ft lbf/s) or Btu/h (IT). */
export function powerToW(value: number, unit: string): number {
  return value * factorOf(unit);
}

/** A power in watts expressed in any power unit. */
export function powerFromW(powerW: number, unit: string): number {
  return powerW / factorOf(unit);
}
