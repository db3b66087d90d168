import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { batchColumnNames } from '@/lib/batch/columns';
import { evaluateSheet } from '@/lib/batch/evaluate';
import { parseBatchCsv } from '@/lib/batch/parse';
import { batchResultCsv } from '@/lib/batch/result-csv';
import { batchTemplateCsv } from '@/lib/batch/template';
import { toRowView } from '@/lib/batch/view';
import { calculate } from '@/lib/engine';

const heaterRow = (i: number): Record<string, string> => ({
  service: 'heater',
  title: `Heater ${i}`,
  equipment_tag: `EH-${100 + i}`,
  gas: i % 2 ? 'air' : 'nitrogen',
  flow_value: String(500 + i * 10),
  flow_unit: 'kg/h',
  inlet_temperature_value: '20',
  inlet_temperature_unit: 'degC',
  inlet_pressure_value: '2',
  inlet_pressure_unit: 'barg',
  outlet_temperature_value: String(150 + i),
  outlet_temperature_unit: 'degC',
  heat_loss_percent: '5',
  design_margin_percent: '10',
  supply_voltage_v: '400',
  supply_phases: '3',
});
const compressorRow = (i: number): Record<string, string> => ({
  service: 'compressor',
  title: `Compressor ${i}`,
  equipment_tag: `K-${100 + i}`,
  gas: 'CH4:0.9;C2H6:0.05;N2:0.05',
  flow_value: String(800 + i),
  flow_unit: 'Nm3/h',
  inlet_temperature_value: '25',
  inlet_temperature_unit: 'degC',
  inlet_pressure_value: '1.2',
  inlet_pressure_unit: 'bar',
  discharge_pressure_value: '6',
  discharge_pressure_unit: 'bar',
  stages: '2',
  isentropic_efficiency: '0.78',
  intercooler_outlet_temperature_value: '35',
  intercooler_outlet_temperature_unit: 'degC',
  method: 'variable-cp',
});

function sheet(rows: Record<string, string>[]): string {
  return Papa.unparse({ fields: batchColumnNames, data: rows.map((r) => batchColumnNames.map((c) => r[c] ?? '')) });
}

describe('batch sizing from a CSV', () => {
  // 200 rows: most valid, some with the classic mistakes.
  const rows = Array.from({ length: 200 }, (_, i) => (i % 3 ? heaterRow(i) : compressorRow(i)));
  rows[10] = { ...rows[10]!, flow_unit: '' }; // missing unit
  rows[20] = { ...rows[20]!, inlet_temperature_value: 'twenty' }; // text in a number
  rows[30] = { ...compressorRow(30), discharge_pressure_value: '0.5' }; // discharge below suction
  rows[40] = { ...rows[40]!, gas: 'unobtainium' }; // unknown gas
  const evaluated = evaluateSheet(parseBatchCsv(sheet(rows)).rows);

  it('sizes the valid rows and reports each bad row by row and column', () => {
    const bad = evaluated.filter((r) => r.problems.length);
    expect(bad.map((r) => r.row)).toEqual([12, 22, 32, 42]);
    expect(bad[0]!.problems.map((p) => p.column)).toContain('flow_unit');
    expect(bad[1]!.problems).toEqual([
      expect.objectContaining({ column: 'inlet_temperature_value', message: expect.stringMatching(/not a number/) }),
    ]);
    expect(bad[2]!.problems.map((p) => p.column)).toContain('discharge_pressure_value');
    expect(bad[3]!.problems.map((p) => p.column)).toContain('gas');
    expect(evaluated.filter((r) => r.result)).toHaveLength(196);
  });

  it('gives the same figures as calculate() for the same request, row by row', () => {
    for (const r of evaluated.filter((x) => x.result).slice(0, 40)) {
      const src = rows[r.row - 2]!;
      const direct = calculate(
        src.service === 'heater'
          ? {
              service: 'heater',
              gas: { preset: src.gas },
              flow: { value: Number(src.flow_value), unit: 'kg/h' },
              inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 2, unit: 'barg' } },
              outletTemperature: { value: Number(src.outlet_temperature_value), unit: 'degC' },
              heatLossPercent: 5,
              designMarginPercent: 10,
              supply: { voltageV: 400, phases: 3 },
            }
          : {
              service: 'compressor',
              gas: { components: { CH4: 0.9, C2H6: 0.05, N2: 0.05 } },
              flow: { value: Number(src.flow_value), unit: 'Nm3/h' },
              inlet: { temperature: { value: 25, unit: 'degC' }, pressure: { value: 1.2, unit: 'bar' } },
              dischargePressure: { value: 6, unit: 'bar' },
              stages: 2,
              isentropicEfficiency: 0.78,
              intercoolerOutletTemperature: { value: 35, unit: 'degC' },
              method: 'variable-cp',
            },
      );
      expect(r.result).toEqual(direct);
    }
  });

  it('writes a result CSV whose figures match the engine', () => {
    const csv = Papa.parse<Record<string, string>>(batchResultCsv(evaluated.map(toRowView)), { header: true }).data;
    const first = evaluated.find((r) => r.result?.service === 'heater')!;
    const line = csv.find((l) => l.row === String(first.row))!;
    expect(Number(line.design_duty_kw)).toBeCloseTo(
      first.result!.service === 'heater' ? first.result!.heater.designDutyKw : NaN,
      2,
    );
    expect(csv.find((l) => l.row === '22')!.status).toBe('error');
  });

  it('refuses sheets with unknown columns or too many rows, and ignores # comment rows of the template', () => {
    expect(parseBatchCsv('service,colour\nheater,blue').problems.join(' ')).toMatch(/Unknown columns: colour/);
    const template = parseBatchCsv(batchTemplateCsv());
    expect(template.problems).toEqual([]);
    const results = evaluateSheet(template.rows);
    expect(results.map((r) => r.problems)).toEqual([[], []]);
  });
});
