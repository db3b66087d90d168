import { ZERO_CELSIUS_K } from './constants';

/** Range of the ASHRAE saturation-pressure formulation, K (-100 to 200 °C) [pub: ASHRAE Handbook Fundamentals 2017, ch. 1]. */
export const ASHRAE_MIN_TEMPERATURE_K = ZERO_CELSIUS_K - 100;
export const ASHRAE_MAX_TEMPERATURE_K = ZERO_CELSIUS_K + 200;

/** Critical point of water [pub: IAPWS-95 (Wagner & Pruss 2002)]. */
export const WATER_CRITICAL_TEMPERATURE_K = 647.096;
const WATER_CRITICAL_PRESSURE_PA = 22.064e6;

const TRIPLE_POINT_K = 273.16;

/**
 * Saturation pressure of water vapour over ice (T <= triple point) or liquid water, Pa, from the
 * Hyland-Wexler equations as given in ASHRAE Handbook Fundamentals 2017 ch. 1 eqs. (5) and (6) [pub].
 * Throws outside -100..200 °C.
 */
export function saturationPressureAshraePa(temperatureK: number): number {
  if (!(temperatureK >= ASHRAE_MIN_TEMPERATURE_K && temperatureK <= ASHRAE_MAX_TEMPERATURE_K)) {
    throw new RangeError('the ASHRAE saturation-pressure formulation covers -100 to 200 °C only');
  }
  const t = temperatureK;
  const lnT = Math.log(t);
  const lnP =
    t <= TRIPLE_POINT_K
      ? -5.6745359e3 / t +
        6.3925247 -
        9.677843e-3 * t +
        6.2215701e-7 * t * t +
        2.0747825e-9 * t * t * t -
        9.484024e-13 * t * t * t * t +
        4.1635019 * lnT
      : -5.8002206e3 / t +
        1.3914993 -
        4.8640239e-2 * t +
        4.1764768e-5 * t * t -
        1.4452093e-8 * t * t * t +
        6.5459673 * lnT;
  return Math.exp(lnP);
}

/**
 * Vapour pressure over liquid water from the triple point to the critical point, Pa
 * [pub: Wagner & Pruss, J. Phys. Chem. Ref. Data 31 (2002), eq. 2.5 (IAPWS auxiliary equation)].
 * Used above the ASHRAE range, to tell whether steam at a given partial pressure would condense.
 */
export function saturationPressureWagnerPrussPa(temperatureK: number): number {
  if (!(temperatureK >= TRIPLE_POINT_K && temperatureK <= WATER_CRITICAL_TEMPERATURE_K)) {
    throw new RangeError('the Wagner-Pruss vapour-pressure equation covers 273.16-647.096 K only');
  }
  const tau = 1 - temperatureK / WATER_CRITICAL_TEMPERATURE_K;
  const sum =
    -7.85951783 * tau +
    1.84408259 * tau ** 1.5 -
    11.7866497 * tau ** 3 +
    22.6807411 * tau ** 3.5 -
    15.9618719 * tau ** 4 +
    1.80122502 * tau ** 7.5;
  return WATER_CRITICAL_PRESSURE_PA * Math.exp((WATER_CRITICAL_TEMPERATURE_K / temperatureK) * sum);
}

/**
 * Saturation pressure for a condensation check anywhere up to the critical point, Pa: ASHRAE up to
 * 200 °C, Wagner-Pruss above; Infinity above the critical temperature (no liquid can form).
 */
export function saturationPressureForCheckPa(temperatureK: number): number {
  if (temperatureK > WATER_CRITICAL_TEMPERATURE_K) return Infinity;
  if (temperatureK <= ASHRAE_MAX_TEMPERATURE_K)
    return saturationPressureAshraePa(Math.max(temperatureK, ASHRAE_MIN_TEMPERATURE_K));
  return saturationPressureWagnerPrussPa(temperatureK);
}
