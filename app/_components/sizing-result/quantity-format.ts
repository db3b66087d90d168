import {
  decimalsFor,
  figure,
  fixed,
  J_PER_KG_K_PER_BTU_PER_LB_F,
  KG_PER_LB,
  SYSTEM_UNITS,
  W_PER_HP,
  pressureFromPa,
  temperatureFromK,
  unitLabel,
  type UnitSystem,
} from '@/lib/units';

export { decimalsFor, figure, fixed };

/** A catalogue or series rating as listed: "90", "5.5", "1,250". */
export function formatRating(value: number): string {
  return fixed(value, Number.isInteger(value) ? 0 : Math.min(3, String(value).split('.')[1]?.length ?? 0));
}

/** Powers and duties, kW. */
export const formatKw = (kw: number) => figure(kw);
/** Currents, A: one decimal. */
export const formatA = (a: number) => fixed(a, 1);
/** Percentages: two decimals. */
export const formatPercent = (p: number) => fixed(p, 2);
export const formatHp = (kw: number) => figure((kw * 1000) / W_PER_HP);

export type Shown = { value: string; unit: string };

/** A temperature in °C shown in the system's unit, one decimal. */
export function showTemperature(celsius: number, system: UnitSystem): Shown {
  const unit = SYSTEM_UNITS[system].temperature;
  return { value: fixed(temperatureFromK(celsius + 273.15, unit), 1), unit: unitLabel(unit) };
}

/** A temperature difference in K shown as K or °F-difference. */
export function showTemperatureDifference(kelvin: number, system: UnitSystem): Shown {
  return system === 'us' ? { value: fixed(kelvin * 1.8, 1), unit: '°F' } : { value: fixed(kelvin, 1), unit: 'K' };
}

/** A mass flow in kg/s shown per hour in the system's mass unit. */
export function showMassFlow(kgPerS: number, system: UnitSystem): Shown {
  return system === 'us'
    ? { value: figure((kgPerS * 3600) / KG_PER_LB), unit: 'lb/h' }
    : { value: figure(kgPerS * 3600), unit: 'kg/h' };
}

/** An absolute pressure in kPa shown as bar abs or psia. */
export function showPressure(kpaAbs: number, system: UnitSystem): Shown {
  const unit = SYSTEM_UNITS[system].absolutePressure;
  const v = pressureFromPa(kpaAbs * 1000, unit);
  return { value: fixed(v, unit === 'psia' ? 2 : 3), unit: unitLabel(unit) };
}

/** cp in J/(kg K) shown as kJ/(kg K) or Btu/(lb °F), four decimals. */
export function showCp(jPerKgK: number, system: UnitSystem): Shown {
  return system === 'us'
    ? { value: fixed(jPerKgK / J_PER_KG_K_PER_BTU_PER_LB_F, 4), unit: 'Btu/(lb·°F)' }
    : { value: fixed(jPerKgK / 1000, 4), unit: 'kJ/(kg·K)' };
}

/** "12.3 °C" */
export const joined = (s: Shown) => `${s.value} ${s.unit}`;
