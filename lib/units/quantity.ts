import { flowFromKgPerS, flowToKgPerS, type FlowContext } from './flow';
import { powerFromW, powerToW } from './power';
import { STANDARD_ATMOSPHERE_PA, pressureFromPa, pressureToPa } from './pressure';
import { temperatureFromK, temperatureToK } from './temperature';
import { normalizeUnit } from './unit-strings';

export type QuantityKind = 'flow' | 'temperature' | 'pressure' | 'power';

/** Inputs some conversions depend on: the site pressure (gauge units) and the gas and state (flows). */
export type ConversionContext = { barometricPressurePa?: number; flow?: FlowContext };

/** SI unit each kind converts through. Pressure is absolute. */
export const SI_UNIT_BY_KIND: Readonly<Record<QuantityKind, string>> = {
  flow: 'kg/s',
  temperature: 'K',
  pressure: 'Pa',
  power: 'W',
};

/** Converts a value in `unit` (aliases allowed) to the SI unit of its kind. */
export function toSi(kind: QuantityKind, value: number, unit: string, ctx: ConversionContext = {}): number {
  const u = normalizeUnit(unit);
  switch (kind) {
    case 'flow':
      return flowToKgPerS(value, u, ctx.flow);
    case 'temperature':
      return temperatureToK(value, u);
    case 'pressure':
      return pressureToPa(value, u, ctx.barometricPressurePa ?? STANDARD_ATMOSPHERE_PA);
    case 'power':
      return powerToW(value, u);
  }
}

/** Converts an SI value back to any unit of its kind (the form uses this to switch units). */
export function fromSi(kind: QuantityKind, siValue: number, unit: string, ctx: ConversionContext = {}): number {
  const u = normalizeUnit(unit);
  switch (kind) {
    case 'flow':
      return flowFromKgPerS(siValue, u, ctx.flow);
    case 'temperature':
      return temperatureFromK(siValue, u);
    case 'pressure':
      return pressureFromPa(siValue, u, ctx.barometricPressurePa ?? STANDARD_ATMOSPHERE_PA);
    case 'power':
      return powerFromW(siValue, u);
  }
}

/** Re-expresses a value from one unit to another of the same kind, keeping the physical value. */
export function convertQuantity(
  kind: QuantityKind,
  value: number,
  fromUnit: string,
  toUnit: string,
  ctx: ConversionContext = {},
): number {
  return fromSi(kind, toSi(kind, value, fromUnit, ctx), toUnit, ctx);
}
