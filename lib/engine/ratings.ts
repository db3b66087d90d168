/**
 * Default catalogue of heater ratings, kW. Dutywise's own stepped list (no particular maker's range);
 * vendors replace it per request with `heaterRatingsKw`.
 */
export const DEFAULT_HEATER_RATINGS_KW: readonly number[] = [
  1, 2, 3, 4, 5, 6, 8, 10, 12, 15, 18, 20, 25, 30, 36, 40, 45, 50, 60, 75, 90, 100, 120, 150, 180, 200, 250, 300, 350,
  400, 450, 500, 600, 750, 900, 1000, 1250, 1500, 1750, 2000, 2500, 3000, 3500, 4000, 5000, 6000, 7500, 10000,
];

// Tolerates the rounding of a duty that lands exactly on a rating.
const RELATIVE_TOLERANCE = 1e-9;

/** The smallest rating not below `dutyKw`, or null when the duty is above the whole list. */
export function selectRating(dutyKw: number, ratingsKw: readonly number[]): number | null {
  let best: number | null = null;
  for (const rating of ratingsKw) {
    if (rating >= dutyKw * (1 - RELATIVE_TOLERANCE) && (best === null || rating < best)) best = rating;
  }
  return best;
}
