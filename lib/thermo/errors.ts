import { MAX_TEMPERATURE_K, MIN_TEMPERATURE_K } from './constants';

/** A temperature outside the 200-6000 K range of the property data; never extrapolated. */
export class ThermoRangeError extends Error {
  readonly temperatureK: number;
  /** `temperatureK` may be ±Infinity when only the side of the range is known (inversions). */
  constructor(temperatureK: number, message?: string) {
    super(
      message ??
        `temperature ${Number.isFinite(temperatureK) ? `${round(temperatureK)} K` : String(temperatureK)} is outside ` +
          `the ${MIN_TEMPERATURE_K}-${MAX_TEMPERATURE_K} K range of the property data`,
    );
    this.name = 'ThermoRangeError';
    this.temperatureK = temperatureK;
  }
}

/** A mixture that cannot be built: unknown species, bad fraction, or fractions not summing to 1. */
export class MixtureError extends Error {
  /** Path relative to the mixture input, e.g. "components.CH4" or "components". */
  readonly path: string;
  constructor(path: string, message: string) {
    super(message);
    this.name = 'MixtureError';
    this.path = path;
  }
}

function round(value: number): number {
  return Math.round(value * 100) / 100;
}
