/** @jsxRuntime automatic @jsxImportSource react */
import { EQUATION_NAMES, type HeaterResult } from '@/lib/engine';
import { formatAmps, formatFigure, formatFixed, formatKw, formatPercent, formatRating } from '../format';
import { headingBlock, kvBlocks, type Block, type KvRow } from './blocks';
import { highlightBlock } from './highlight';
import { colors } from './theme';

/** The selected catalogue rating, or why there is none. */
export function ratingText(kw: number | null): string {
  return kw === null ? 'above the largest rating listed' : `${formatRating(kw)} kW`;
}

/** Heater duties from absorbed to design, the rating chosen and the supply currents. */
export function heaterResultBlocks(r: HeaterResult): Block[] {
  const h = r.heater;
  const e = h.electrical;
  const basis = e.powerBasis === 'selected-rating' ? 'on the selected rating' : 'on the design duty';
  const rows: KvRow[] = [
    [
      'Absorbed duty',
      formatKw(h.absorbedDutyKw),
      r.basis.equationOfState === 'ideal-gas' || !r.basis.equationOfState
        ? 'mass flow x (h out - h in), ideal gas'
        : `mass flow x (h(T out, p) - h(T in, p)), ${EQUATION_NAMES[r.basis.equationOfState]}`,
    ],
    ...(h.idealGasDifferencePercent !== null && h.idealGasDifferencePercent !== undefined
      ? [
          [
            'Ideal-gas duty',
            formatKw(h.idealGasDutyKw),
            `difference ${formatPercent(h.idealGasDifferencePercent)} from the real-gas duty`,
          ] as KvRow,
          [
            'Z at inlet / outlet',
            `${formatFixed(h.properties.inlet.z, 4)} / ${formatFixed(h.properties.outlet.z, 4)}`,
          ] as KvRow,
        ]
      : []),
    ['Average-cp estimate', formatKw(h.averageCpDutyKw), `difference ${formatPercent(h.averageCpDifferencePercent)}`],
    [
      'cp at mean temperature',
      `${formatFigure(h.cpMeanJPerKgK)} J/(kg K)`,
      `at ${formatFixed(h.properties.mean.temperatureC, 1)} °C`,
    ],
    ['Heat-loss allowance', formatKw(h.heatLossKw), formatPercent(h.heatLossPercent)],
    ['Design margin', formatKw(h.marginKw), formatPercent(h.designMarginPercent)],
    ['Design duty', formatKw(h.designDutyKw)],
    ['Selected rating', ratingText(h.selectedRatingKw)],
    ['Supply voltage', `${formatRating(e.voltageV)} V, ${e.phases}-phase`],
    ['Line current', formatAmps(e.currentA), `${basis} (${formatKw(e.powerBasisKw)})`],
    ['Continuous-load current (125 %)', formatAmps(e.continuousCurrentA), 'conductors and overcurrent protection'],
    ['Circuit subdivision', e.subdivisionRequired ? 'required' : 'not required', 'resistance loads above 48 A'],
    ['Outlet actual flow', `${formatFigure(h.outletActualFlowM3PerH)} m³/h`, 'at the inlet pressure'],
  ];
  return [
    headingBlock('3', 'Results: heater'),
    highlightBlock(
      'hh',
      [
        { label: 'Absorbed duty', value: formatKw(h.absorbedDutyKw) },
        { label: 'Design duty', value: formatKw(h.designDutyKw) },
        { label: 'Selected rating', value: ratingText(h.selectedRatingKw) },
        { label: 'Line current', value: formatAmps(e.currentA) },
      ],
      colors.copper,
    ),
    ...kvBlocks('hr', rows),
  ];
}
