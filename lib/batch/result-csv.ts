import { toCsv } from '@/lib/csv/write';
import type { BatchRowView } from './view';

export const figureColumns = [
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
];

export const resultColumns = [
  'row',
  'status',
  'title',
  'equipment_tag',
  'service',
  ...figureColumns,
  'warnings',
  'problems',
];

/** One line per batch row with the engine's figures and warnings, or the row's problems. */
export function batchResultCsv(rows: readonly BatchRowView[]): string {
  return toCsv(
    resultColumns,
    rows.map((b) => [
      b.row,
      b.figures ? 'sized' : 'error',
      b.meta.title ?? '',
      b.meta.equipmentTag ?? '',
      b.service ?? b.cells.service ?? '',
      ...(b.figures ?? figureColumns.map(() => '')),
      b.warnings.map((w) => w.message).join(' | '),
      b.problems.map((p) => `${p.column}: ${p.message}`).join('; '),
    ]),
  );
}
