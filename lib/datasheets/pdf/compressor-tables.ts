import type { CompressionMethodResult, CompressorBlock } from '@/lib/engine';
import { formatFigure, formatFixed, formatPercent } from '../format';
import { tableBlocks, type Block, type Column } from './blocks';

export const methodLabel = (basis: CompressorBlock['basis']) =>
  basis === 'variable-cp' ? 'variable cp' : 'constant k';

/** The headline method's figures; the other method is compared in its own table. */
export function headlineMethod(c: CompressorBlock): CompressionMethodResult {
  return c.basis === 'constant-k' ? c.constantK : c.variableCp;
}

const maxDischargeC = (m: CompressionMethodResult) => Math.max(...m.stages.map((st) => st.dischargeTemperatureC));

/** One row per stage: pressures, temperatures, work, power and the cooler that follows it. */
export function stageTableBlocks(c: CompressorBlock): Block[] {
  const m = headlineMethod(c);
  const rows = m.stages.map((st, i) => {
    const cooler = m.intercoolerDutiesKw[i];
    const after =
      cooler !== undefined
        ? formatFigure(cooler)
        : i === m.stages.length - 1 && m.aftercoolerDutyKw !== null
          ? `${formatFigure(m.aftercoolerDutyKw)} (after)`
          : '—';
    return [
      String(st.stage),
      formatFixed(st.pressureRatio, 3),
      formatFigure(st.inletPressureKpa),
      formatFigure(st.dischargePressureKpa),
      formatFixed(st.inletTemperatureC, 1),
      formatFixed(st.isentropicDischargeTemperatureC, 1),
      formatFixed(st.dischargeTemperatureC, 1),
      formatFigure(st.specificWorkKjPerKg),
      formatFigure(st.gasPowerKw),
      after,
    ];
  });
  const col = (title: string, widthPct: number): Column => ({ title, widthPct, align: 'right' });
  const columns: Column[] = [
    { title: 'Stage', widthPct: 7 },
    col('Ratio', 10),
    col('p in kPa a', 10),
    col('p out kPa a', 11),
    col('T in °C', 9),
    col('T2s °C', 9),
    col('T out °C', 9),
    col('Work kJ/kg', 10),
    col('Gas kW', 10),
    col('Cooler kW', 15),
  ];
  return tableBlocks('st', columns, rows);
}

/** Constant-k and variable-cp side by side, with how far apart they land. */
export function methodBlocks(c: CompressorBlock): Block[] {
  const k = c.constantK;
  const v = c.variableCp;
  const rel = (a: number, b: number) => (b === 0 ? '—' : formatPercent(((a - b) / b) * 100));
  const rows = [
    ['Gas power, kW', formatFigure(k.gasPowerKw), formatFigure(v.gasPowerKw), formatPercent(c.methodDifferencePercent)],
    [
      'Specific work, kJ/kg',
      formatFigure(k.specificWorkKjPerKg),
      formatFigure(v.specificWorkKjPerKg),
      rel(k.specificWorkKjPerKg, v.specificWorkKjPerKg),
    ],
    [
      'Highest discharge, °C',
      formatFixed(maxDischargeC(k), 1),
      formatFixed(maxDischargeC(v), 1),
      `${formatFixed(maxDischargeC(k) - maxDischargeC(v), 1)} K`,
    ],
    [
      'Intercooling total, kW',
      formatFigure(k.totalIntercoolerDutyKw),
      formatFigure(v.totalIntercoolerDutyKw),
      rel(k.totalIntercoolerDutyKw, v.totalIntercoolerDutyKw),
    ],
    [
      'k / cp at suction',
      `${formatFixed(k.k, 4)} / ${formatFigure(k.cpJPerKgK)}`,
      `${formatFixed(v.k, 4)} / ${formatFigure(v.cpJPerKgK)}`,
      '',
    ],
  ];
  const columns: Column[] = [
    { title: 'Quantity', widthPct: 31 },
    { title: 'Constant k', widthPct: 23, align: 'right' },
    { title: 'Variable cp', widthPct: 23, align: 'right' },
    { title: 'Difference', widthPct: 23, align: 'right' },
  ];
  return tableBlocks('mc', columns, rows);
}
