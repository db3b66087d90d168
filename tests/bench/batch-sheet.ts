// The batch sheet the benchmarks upload: valid rows in the template's columns.
import Papa from 'papaparse';
import { batchColumnNames } from '@/lib/batch/columns';

/** A CSV of `n` duty points, heaters and 3-stage gas compressors in turn, tagged from `tagFrom`. */
export function batchSheet(n: number, tagFrom = 0): string {
  const rows = Array.from({ length: n }, (_, i) => {
    const heater = i % 2 === 0;
    const r: Record<string, string> = heater
      ? {
          service: 'heater',
          title: `Heater ${i}`,
          equipment_tag: `EH-${tagFrom + i}`,
          gas: 'air',
          flow_value: String(200 + i),
          flow_unit: 'kg/h',
          inlet_temperature_value: '20',
          inlet_temperature_unit: 'degC',
          inlet_pressure_value: '2',
          inlet_pressure_unit: 'barg',
          outlet_temperature_value: '250',
          outlet_temperature_unit: 'degC',
          heat_loss_percent: '5',
          design_margin_percent: '10',
        }
      : {
          service: 'compressor',
          title: `Compressor ${i}`,
          equipment_tag: `K-${tagFrom + i}`,
          gas: 'CH4:0.9;C2H6:0.05;N2:0.05',
          flow_value: String(500 + i),
          flow_unit: 'Nm3/h',
          inlet_temperature_value: '25',
          inlet_temperature_unit: 'degC',
          inlet_pressure_value: '1',
          inlet_pressure_unit: 'bar',
          discharge_pressure_value: '20',
          discharge_pressure_unit: 'bar',
          stages: '3',
          isentropic_efficiency: '0.78',
        };
    return batchColumnNames.map((c) => r[c] ?? '');
  });
  return Papa.unparse({ fields: batchColumnNames, data: rows });
}
