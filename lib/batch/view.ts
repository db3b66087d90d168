import { headlineMethod, type SizingWarning } from '@/lib/engine';
import type { BatchRow } from './evaluate';

// What a checked row sends back to the desk: its cells, problems, headline, warnings and the figures of the
// result CSV; the full engine result stays on the server so a 10,000-row sheet stays a small answer.

export type BatchRowView = Omit<BatchRow, 'input' | 'result'> & {
  service: 'heater' | 'compressor' | null;
  headline: { kw: number; basis: 'design duty' | 'shaft power' } | null;
  /** The engine's warnings and dangers for this duty point, in its own words (SI). */
  warnings: SizingWarning[];
  /** The result CSV's figure columns, in order; null for a row that was not sized. */
  figures: (string | number)[] | null;
};

const r = (n: number | null | undefined, digits = 3) =>
  n === null || n === undefined || !Number.isFinite(n) ? '' : Number(n.toFixed(digits));

function figuresOf(res: NonNullable<BatchRow['result']>): (string | number)[] {
  const h = res.service === 'heater' ? res.heater : null;
  const c = res.service === 'compressor' ? res.compressor : null;
  const basis = c ? headlineMethod(c) : null;
  return [
    res.basis.equationOfState ?? '',
    r(res.massFlowKgPerS, 5),
    r(h?.absorbedDutyKw),
    r(h?.idealGasDutyKw),
    r(h?.averageCpDutyKw),
    r(h?.designDutyKw),
    r(h?.selectedRatingKw ?? null),
    r(h?.electrical.currentA, 1),
    r(c?.gasPowerKw),
    r(c?.shaftPowerKw),
    r(c?.motor.iecKw ?? null),
    r(c?.motor.nemaHp ?? null),
    r(basis ? Math.max(...basis.stages.map((s) => s.dischargeTemperatureC)) : null, 1),
    r(basis?.totalIntercoolerDutyKw),
    r(basis?.condensateKgPerH),
    r(h ? h.idealGasDifferencePercent : (c?.idealGasDifferencePercent ?? null), 2),
  ];
}

/** The desk's view of one evaluated row. */
export function toRowView(b: BatchRow): BatchRowView {
  const res = b.result;
  return {
    row: b.row,
    cells: b.cells,
    meta: b.meta,
    problems: b.problems,
    service: res?.service ?? null,
    headline: !res
      ? null
      : res.service === 'heater'
        ? { kw: res.heater.designDutyKw, basis: 'design duty' }
        : { kw: res.compressor.shaftPowerKw, basis: 'shaft power' },
    warnings: (res?.warnings ?? []).filter((w) => w.severity === 'warning' || w.severity === 'danger'),
    figures: res ? figuresOf(res) : null,
  };
}
