import {
  fixed,
  formatA,
  formatKw,
  formatPercent,
  formatRating,
  joined,
  showCp,
  showTemperature,
  type Shown,
} from '@/app/_components/sizing-result/quantity-format';
import type { HeaterResult } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';

const t = (c: number, s: UnitSystem) => joined(showTemperature(c, s));
const kw = (v: number) => `${formatKw(v)} kW`;

/** Headline and figure lines of a heater result. */
export function heaterLines(r: HeaterResult, system: UnitSystem): { headline: string[]; figures: string[] } {
  const h = r.heater;
  const e = h.electrical;
  const phase = e.phases === 3 ? 'three-phase' : 'single-phase';
  const rating =
    h.selectedRatingKw === null
      ? 'above the largest catalogue rating'
      : `catalogue rating ${formatRating(h.selectedRatingKw)} kW`;
  const cpMean: Shown = showCp(h.cpMeanJPerKgK, system);
  const flagged = Math.abs(h.temperatureRiseK) > 200 ? ' (rise above 200 K: do not use the estimate)' : '';
  return {
    headline: [
      `Design heater duty: ${kw(h.designDutyKw)}; ${rating}`,
      `Supply ${fixed(e.voltageV, 0)} V ${phase}: ${formatA(e.currentA)} A line current on ${kw(e.powerBasisKw)}; ` +
        `${formatA(e.continuousCurrentA)} A for conductors and protection (125 %)${e.subdivisionRequired ? '; subdivide into circuits' : ''}`,
    ],
    figures: [
      `Inlet ${t(h.inletTemperatureC, system)}, outlet ${t(h.outletTemperatureC, system)} (rise ${fixed(h.temperatureRiseK, 1)} K)`,
      `Absorbed duty (enthalpy integral): ${kw(h.absorbedDutyKw)}`,
      `Average-cp estimate: ${kw(h.averageCpDutyKw)} (${formatPercent(h.averageCpDifferencePercent)} %), cp at mean temperature ${joined(cpMean)}${flagged}`,
      `Heat loss ${fixed(h.heatLossPercent, 1)} %: ${kw(h.heatLossKw)}; design margin ${fixed(h.designMarginPercent, 1)} %: ${kw(h.marginKw)}`,
      `Design duty: ${kw(h.designDutyKw)}`,
      `Outlet actual flow: ${fixed(h.outletActualFlowM3PerH, 1)} m³/h`,
    ],
  };
}
