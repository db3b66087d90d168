import { headlineMethod } from '@/lib/engine';
import { toCsv } from '@/lib/csv/write';
import type { BatchRow } from './evaluate';

const r = (n: number | null | undefined, digits = 3) =>
  n === null || n === undefined || !Number.isFinite(n) ? '' : Number(n.toFixed(digits));

export const resultColumns = [
  'row',
  'status',
  'title',
  'equipment_tag',
  'service',
  'equation_of_state',
  'mass_flow_kg_per_s',
  'absorbed_duty_kw',
  'ideal_gas_duty_kw',
  'average_cp_duty_kw',
  'design_duty_kw',
  'selected_rating_kw',
  'current_a',
  'gas_power_kw',
  'shaft_power_kw',
  'motor_iec_kw',
  'motor_nema_hp',
  'max_discharge_temperature_c',
  'intercooler_duty_kw',
  'condensate_kg_per_h',
  'ideal_gas_difference_percent',
  'warnings',
  'problems',
];

/** One line per batch row with the engine's figures, or the row's problems. */
export function batchResultCsv(rows: BatchRow[]): string {
  return toCsv(
    resultColumns,
    rows.map((b) => {
      const res = b.result;
      const h = res?.service === 'heater' ? res.heater : null;
      const c = res?.service === 'compressor' ? res.compressor : null;
      const basis = c ? headlineMethod(c) : null;
      return [
        b.row,
        res ? 'sized' : 'error',
        b.meta.title ?? '',
        b.meta.equipmentTag ?? '',
        res?.service ?? b.cells.service ?? '',
        res?.basis.equationOfState ?? '',
        r(res?.massFlowKgPerS, 5),
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
        (res?.warnings ?? [])
          .filter((w) => w.severity === 'warning' || w.severity === 'danger')
          .map((w) => w.message)
          .join(' | '),
        b.problems.map((p) => `${p.column}: ${p.message}`).join('; '),
      ];
    }),
  );
}
