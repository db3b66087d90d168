import type { HeaterResult } from '@/lib/engine';
import { EQUATION_NAMES } from '@/lib/engine/headline-method';
import type { UnitSystem } from '@/lib/units';
import { FigureTable, type FigureRow } from './figure-table';
import { PropertiesTable } from './properties-table';
import {
  fixed,
  formatA,
  formatKw,
  formatPercent,
  formatRating,
  joined,
  showCp,
  showTemperature,
} from './quantity-format';
import { SeverityIcon } from './severity-icon';

/** Duty build-up from absorbed to design, the average-cp check, and the electrical figures. */
export function HeaterBreakdown({ result, system }: { result: HeaterResult; system: UnitSystem }) {
  const h = result.heater;
  const e = h.electrical;
  const flagged = Math.abs(h.temperatureRiseK) > 200;
  const real = h.idealGasDifferencePercent !== null && h.idealGasDifferencePercent !== undefined;
  const duty: FigureRow[] = [
    {
      label: 'Absorbed duty',
      note: real
        ? `m (h(T out, p) - h(T in, p)), ${EQUATION_NAMES[result.basis.equationOfState]}`
        : 'm (h(T out) - h(T in)), ideal-gas enthalpy integral',
      value: formatKw(h.absorbedDutyKw),
      unit: 'kW',
      testId: 'breakdown-absorbed-kw',
    },
    ...(real
      ? [
          {
            label: 'Ideal-gas duty',
            note: `${formatPercent(h.idealGasDifferencePercent!)} % from the real-gas duty; Z ${fixed(h.properties.inlet.z, 4)} in, ${fixed(h.properties.outlet.z, 4)} out`,
            value: formatKw(h.idealGasDutyKw),
            unit: 'kW',
            testId: 'breakdown-ideal-gas-kw',
          },
        ]
      : []),
    { label: `Heat loss ${h.heatLossPercent} %`, note: 'of absorbed', value: formatKw(h.heatLossKw), unit: 'kW' },
    {
      label: `Design margin ${h.designMarginPercent} %`,
      note: 'of absorbed + loss',
      value: formatKw(h.marginKw),
      unit: 'kW',
    },
    { label: 'Design duty', value: formatKw(h.designDutyKw), unit: 'kW', strong: true, testId: 'breakdown-design-kw' },
    {
      label: 'Selected catalogue rating',
      value: h.selectedRatingKw === null ? 'none' : formatRating(h.selectedRatingKw),
      unit: h.selectedRatingKw === null ? undefined : 'kW',
    },
  ];
  const check: FigureRow[] = [
    {
      label: `cp at mean ${joined(showTemperature(h.properties.mean.temperatureC, system))}`,
      value: showCp(h.cpMeanJPerKgK, system).value,
      unit: showCp(h.cpMeanJPerKgK, system).unit,
    },
    {
      label: 'Average-cp estimate',
      note: 'm cp(T mean) ΔT, for hand checks',
      value: formatKw(h.averageCpDutyKw),
      unit: 'kW',
    },
    {
      label: (
        <span className="inline-flex items-center gap-1">
          {flagged && <SeverityIcon severity="caution" className="h-3.5 w-3.5" />}Difference from absorbed
        </span>
      ),
      note: flagged
        ? `rise ${fixed(h.temperatureRiseK, 1)} K is over 200 K: do not use the estimate`
        : `rise ${fixed(h.temperatureRiseK, 1)} K, within 200 K`,
      value: formatPercent(h.averageCpDifferencePercent),
      unit: '%',
      testId: 'breakdown-average-cp-difference',
    },
  ];
  const electrical: FigureRow[] = [
    { label: 'Supply', value: `${fixed(e.voltageV, 0)} V`, unit: e.phases === 3 ? '3-phase' : '1-phase' },
    {
      label: 'Current figured on',
      value: e.powerBasis === 'selected-rating' ? formatRating(e.powerBasisKw) : formatKw(e.powerBasisKw),
      unit: 'kW',
      note: e.powerBasis === 'selected-rating' ? 'the selected rating' : 'the design duty',
    },
    { label: 'Line current', value: formatA(e.currentA), unit: 'A' },
    {
      label: 'Conductors and protection (125 %)',
      value: formatA(e.continuousCurrentA),
      unit: 'A',
      note: 'NEC 424.4(B) / Art. 425; IEC 60364-4-43 elsewhere',
    },
    {
      label: 'Circuit subdivision',
      value: e.subdivisionRequired ? 'required' : 'not required',
      note: 'resistance loads over 48 A',
    },
  ];
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <FigureTable caption="Duty" rows={duty} testId="heater-duty-table" />
      <FigureTable caption="Average-cp check" rows={check} />
      <FigureTable caption="Electrical" rows={electrical} testId="heater-electrical-table" />
      <PropertiesTable h={h} system={system} />
    </div>
  );
}
