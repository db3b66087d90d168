import { METHOD_NAMES, headlineMethod, type CompressionMethodResult, type CompressorBlock } from '@/lib/engine';
import { formatFigure, formatFixed, formatPercent } from '../format';
import { tableBlocks, type Block, type Column } from './blocks';

export const methodLabel = (basis: CompressorBlock['basis']) => METHOD_NAMES[basis];

const maxDischargeC = (m: CompressionMethodResult) => Math.max(...m.stages.map((st) => st.dischargeTemperatureC));
const col = (title: string, widthPct: number): Column => ({ title, widthPct, align: 'right' });

/** One row per stage of the headline method: the suction and discharge states frames are chosen from. */
export function stageStreamBlocks(c: CompressorBlock): Block[] {
  const m = headlineMethod(c);
  const rows = m.stages.map((st) => [
    String(st.stage),
    formatFigure(st.inletPressureKpa),
    formatFigure(st.dischargePressureKpa),
    formatFixed(st.inletTemperatureC, 1),
    formatFixed(st.dischargeTemperatureC, 1),
    `${formatFixed(st.inletZ, 4)} / ${formatFixed(st.dischargeZ, 4)}`,
    formatFigure(st.inletDensityKgPerM3),
    formatFigure(st.inletActualFlowM3PerH),
    formatFigure(st.inletActualFlowAcfm),
    formatFigure(st.massFlowKgPerS * 3600),
  ]);
  const columns: Column[] = [
    { title: 'Stage', widthPct: 7 },
    col('p in kPa a', 10),
    col('p out kPa a', 11),
    col('T in °C', 9),
    col('T out °C', 9),
    col('Z in / out', 14),
    col('Dens. kg/m³', 10),
    col('Q in m³/h', 10),
    col('Q in ACFM', 10),
    col('m kg/h', 10),
  ];
  return tableBlocks('ss', columns, rows);
}

/** One row per stage: ratio, heads, efficiencies, work, power and the cooler that follows it. */
export function stageTableBlocks(c: CompressorBlock): Block[] {
  const m = headlineMethod(c);
  const rows = m.stages.map((st) => {
    const cooler = st.cooler;
    const after = cooler
      ? `${formatFigure(cooler.dutyKw)}${cooler.kind === 'aftercooler' ? ' (after)' : ''}${
          cooler.condensateKgPerH > 0 ? `; ${formatFigure(cooler.condensateKgPerH)} kg/h liquid` : ''
        }`
      : '—';
    return [
      String(st.stage),
      formatFixed(st.pressureRatio, 3),
      formatFigure(st.isentropicHeadKjPerKg),
      `${formatFigure(st.polytropicHeadKjPerKg)} / ${formatFigure(st.polytropicHeadM)}`,
      `${formatFixed(st.isentropicEfficiency, 3)} / ${formatFixed(st.polytropicEfficiency, 3)}`,
      formatFixed(st.polytropicExponent, 3),
      formatFigure(st.specificWorkKjPerKg),
      formatFigure(st.gasPowerKw),
      after,
    ];
  });
  const columns: Column[] = [
    { title: 'Stage', widthPct: 7 },
    col('Ratio', 8),
    col('Hs kJ/kg', 8),
    col('Hp kJ/kg / m', 14),
    col('Eff. s / p', 14),
    col('n', 6),
    col('Work kJ/kg', 10),
    col('Gas kW', 8),
    col('Cooler kW', 23),
  ];
  return tableBlocks('st', columns, rows);
}

/** The methods side by side (real gas first when computed), with how far ideal gas lands from the headline. */
export function methodBlocks(c: CompressorBlock): Block[] {
  const methods = [
    ...(c.realGas ? [['Real gas', c.realGas] as const] : []),
    ['Variable cp', c.variableCp] as const,
    ['Constant k', c.constantK] as const,
  ];
  const ref = headlineMethod(c);
  const rel = (a: number, b: number) => (b === 0 ? '—' : formatPercent(((a - b) / b) * 100));
  const rows = [
    ['Gas power, kW', ...methods.map(([, m]) => formatFigure(m.gasPowerKw))],
    ['Specific work, kJ/kg', ...methods.map(([, m]) => formatFigure(m.specificWorkKjPerKg))],
    ['Highest discharge, °C', ...methods.map(([, m]) => formatFixed(maxDischargeC(m), 1))],
    ['Intercooling total, kW', ...methods.map(([, m]) => formatFigure(m.totalIntercoolerDutyKw))],
    ['Power vs headline', ...methods.map(([, m]) => (m === ref ? 'headline' : rel(m.gasPowerKw, ref.gasPowerKw)))],
    ['k / cp at suction', ...methods.map(([, m]) => `${formatFixed(m.k, 4)} / ${formatFigure(m.cpJPerKgK)}`)],
  ];
  const width = Math.floor(69 / methods.length);
  const columns: Column[] = [
    { title: 'Quantity', widthPct: 100 - width * methods.length },
    ...methods.map(([name, m]) => col(m === ref ? `${name} (headline)` : name, width)),
  ];
  return tableBlocks('mc', columns, rows);
}
