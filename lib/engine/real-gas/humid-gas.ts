import type { GasModel } from '../../thermo/gas-model';
import type { CoolerFlash, InletClassification } from '../../thermo/phase';
import { WATER_CRITICAL_TEMPERATURE_K, saturationPressureForCheckPa } from '../../thermo/water-saturation';

/*
 * Water in a light gas (humid air, wet nitrogen, hydrogen or fuel gas) condenses where its partial pressure
 * reaches the saturation pressure of water: x_w p = p_sat(T) (Raoult's law with the gas insoluble; the
 * enhancement factor is within a few per cent of 1 below about 3 MPa [pub: ASHRAE Handbook Fundamentals,
 * ch. 1, moist-air properties]). Peng-Robinson's own vapour pressure of water runs 5-15 % low at 300-370 K,
 * which would call moist air at 85 % relative humidity wet; for these gases the saturation curve
 * (ASHRAE formulation below 200 °C, Wagner-Pruss above) decides instead.
 */

/** Components that stay gaseous wherever the sizing's temperatures and this rule's pressures reach [cp]. */
const LIGHT: ReadonlySet<string> = new Set(['N2', 'O2', 'Ar', 'He', 'H2', 'CO', 'CH4', 'CO2']);
/** Above this pressure water's solubility and the enhancement factor matter: Peng-Robinson decides [cp]. */
export const HUMID_RULE_MAX_PA = 3e6;

/** True when water is the only component of the gas that can condense at pressures up to 3 MPa. */
export function isHumidLightGas(gas: GasModel, pressurePa: number): boolean {
  const x = gas.moleFractions;
  if (!(x.H2O !== undefined && x.H2O > 0) || pressurePa > HUMID_RULE_MAX_PA) return false;
  // Carbon dioxide liquefies above about 3.5 MPa only: its partial pressure here stays far below that.
  return Object.keys(x).every((id) => id === 'H2O' || LIGHT.has(id));
}

/** Temperature at which water vapour at partial pressure p_w saturates (dew or frost point), K. */
export function waterDewPointK(partialPa: number): number {
  let lo = 173.15;
  let hi = WATER_CRITICAL_TEMPERATURE_K;
  if (saturationPressureForCheckPa(lo) >= partialPa) return lo;
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + hi);
    if (saturationPressureForCheckPa(mid) < partialPa) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** The inlet of a humid light gas: a gas above its dew point, else two-phase (liquid water and the gas). */
export function classifyHumidGas(gas: GasModel, temperatureK: number, pressurePa: number): InletClassification {
  const xw = gas.moleFractions.H2O!;
  const dewK = waterDewPointK(xw * pressurePa);
  if (xw >= 1 && dewK > temperatureK) {
    // Pure water (steam) above its vapour pressure is liquid.
    return {
      phase: 'liquid',
      detail: { compressibility: 0, saturationPressurePa: saturationPressureForCheckPa(temperatureK) },
    };
  }
  if (dewK <= temperatureK) {
    return { phase: 'gas', dewPointK: dewK, dewMarginK: temperatureK - dewK, compressibility: 1 };
  }
  const split = humidGasSplit(gas, temperatureK, pressurePa)!;
  return {
    phase: 'two-phase',
    detail: {
      vapourFraction: split.vapourFraction,
      vapour: split.vapour,
      liquid: { H2O: 1 },
      zVapour: 1,
      zLiquid: 0,
      dewPointK: dewK,
      dewPressurePa: saturationPressureForCheckPa(temperatureK) / xw,
      nearCritical: false,
    },
  };
}

/** The split at a cooler outlet: pure water knocked out down to saturation, or null when nothing condenses. */
export function humidGasSplit(gas: GasModel, temperatureK: number, pressurePa: number): CoolerFlash | null {
  const x = gas.moleFractions;
  const xw = x.H2O!;
  const yw = saturationPressureForCheckPa(temperatureK) / pressurePa;
  if (!(yw < xw)) return null;
  // Per mole of feed: V (1 - yw) = 1 - xw (the dry gas stays), L = 1 - V of pure water.
  const v = (1 - xw) / (1 - yw);
  const vapour: Record<string, number> = {};
  for (const [id, xi] of Object.entries(x) as [string, number][]) {
    vapour[id] = id === 'H2O' ? yw : xi / v;
  }
  return {
    vapourFraction: v,
    vapour,
    condensate: { H2O: 1 },
    zVapour: 1,
    zCondensate: null,
    condensatePhases: null,
    nearCritical: false,
  };
}
