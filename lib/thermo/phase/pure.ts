import { componentsFor, criticalConstantsOf, type PengRobinsonOptions } from '../eos/peng-robinson';
import { requirePositive } from '../eos/peng-robinson/errors';
import { pureSaturation, pureSaturationTemperature } from './vapour-pressure';

/** Peng-Robinson vapour pressure of one species at T (K), Pa; null at or above its critical temperature. */
export function vapourPressure(speciesId: string, temperatureK: number, options?: PengRobinsonOptions): number | null {
  requirePositive('temperatureK', temperatureK, 'K');
  criticalConstantsOf(speciesId, options);
  return pureSaturation(componentsFor([speciesId], options), temperatureK)?.pressurePa ?? null;
}

/** Peng-Robinson saturation temperature of one species at p (Pa), K; null at or above its critical pressure. */
export function saturationTemperature(
  speciesId: string,
  pressurePa: number,
  options?: PengRobinsonOptions,
): number | null {
  requirePositive('pressurePa', pressurePa, 'Pa');
  criticalConstantsOf(speciesId, options);
  return pureSaturationTemperature(componentsFor([speciesId], options), pressurePa);
}
