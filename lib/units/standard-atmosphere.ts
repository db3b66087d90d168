// ISO 2533 (1975) standard atmosphere, troposphere layer [pub: ISO 2533; identical to U.S. Standard
// Atmosphere 1976 below 32 km]: T0 288.15 K, p0 101 325 Pa, lapse rate 6.5 K/km, gn 9.80665 m/s2,
// R_air 287.05287 J/(kg K), nominal Earth radius 6 356 766 m for the geopotential altitude.
const T0_K = 288.15;
const P0_PA = 101_325;
const LAPSE_K_PER_M = 0.0065;
const STANDARD_GRAVITY = 9.80665;
const AIR_GAS_CONSTANT = 287.05287;
const EARTH_RADIUS_M = 6_356_766;
const EXPONENT = STANDARD_GRAVITY / (AIR_GAS_CONSTANT * LAPSE_K_PER_M);

/** Site altitudes accepted, m above sea level (the ISO 2533 tables start at -2000 m; 11 km ends the layer). */
export const MIN_SITE_ALTITUDE_M = -2000;
export const MAX_SITE_ALTITUDE_M = 11_000;

/** Geopotential altitude from geometric altitude (site elevation), m. */
export function geopotentialAltitudeM(geometricAltitudeM: number): number {
  return (EARTH_RADIUS_M * geometricAltitudeM) / (EARTH_RADIUS_M + geometricAltitudeM);
}

/** Standard-atmosphere pressure at a site elevation (geometric altitude above sea level), Pa. */
export function standardAtmospherePressurePa(altitudeM: number): number {
  if (!(altitudeM >= MIN_SITE_ALTITUDE_M && altitudeM <= MAX_SITE_ALTITUDE_M)) {
    throw new RangeError(`altitude must be between ${MIN_SITE_ALTITUDE_M} and ${MAX_SITE_ALTITUDE_M} m`);
  }
  const h = geopotentialAltitudeM(altitudeM);
  return P0_PA * (1 - (LAPSE_K_PER_M * h) / T0_K) ** EXPONENT;
}

/** Standard-atmosphere temperature at a site elevation, K. */
export function standardAtmosphereTemperatureK(altitudeM: number): number {
  return T0_K - LAPSE_K_PER_M * geopotentialAltitudeM(altitudeM);
}
