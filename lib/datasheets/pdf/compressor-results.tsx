/** @jsxRuntime automatic @jsxImportSource react */
import type { CompressorResult } from '@/lib/engine';
import {
  formatAmps,
  formatFigure,
  formatFixed,
  formatKw,
  formatPercent,
  formatRating,
  formatTemperatureC,
} from '../format';
import { block, headingBlock, kvBlocks, type Block, type KvRow } from './blocks';
import { headlineMethod } from '@/lib/engine';
import { methodBlocks, methodLabel, stageStreamBlocks, stageTableBlocks } from './compressor-tables';
import { highlightBlock } from './highlight';
import { pdfKit } from './kit';
import { colors, styles } from './theme';

export const iecText = (kw: number | null) => (kw === null ? 'above IEC series' : `${formatRating(kw)} kW`);
export const nemaText = (hp: number | null) => (hp === null ? 'above NEMA series' : `${formatRating(hp)} hp`);

function suggestion(stages: number | null, limitC: number): string {
  return stages === null
    ? `no count up to 6 keeps every stage under ${formatTemperatureC(limitC)}`
    : `${stages} (fewest keeping every stage under ${formatTemperatureC(limitC)})`;
}

function caption(key: string, text: string): Block {
  const { Text } = pdfKit();
  return block(key, 18, <Text style={[styles.strong, { marginTop: 6, marginBottom: 2 }]}>{text}</Text>, true);
}

/** Stages, both methods, coolers, shaft power, motor ratings and the stage suggestion. */
export function compressorResultBlocks(r: CompressorResult): Block[] {
  const c = r.compressor;
  const m = headlineMethod(c);
  const pct = (p: number | null) => (p === null ? '' : `margin ${formatPercent(p)}`);
  const rows: KvRow[] = [
    ['Gas power', formatKw(c.gasPowerKw), `${methodLabel(c.basis)} basis`],
    ['Shaft power', formatKw(c.shaftPowerKw), `gas power / ${formatFixed(c.mechanicalEfficiency, 3)}`],
    [
      'Intercooler duties',
      m.intercoolerDutiesKw.length
        ? `${m.intercoolerDutiesKw.map(formatFigure).join(' + ')} kW`
        : 'none (single stage)',
      `total ${formatKw(m.totalIntercoolerDutyKw)}`,
    ],
    ...(m.aftercoolerDutyKw !== null ? [['Aftercooler duty', formatKw(m.aftercoolerDutyKw)] as KvRow] : []),
    ...(m.condensateKgPerH > 0
      ? [['Condensate knocked out', `${formatFigure(m.condensateKgPerH)} kg/h`] as KvRow]
      : []),
    ...(c.idealGasDifferencePercent !== null
      ? [
          [
            'Ideal gas vs real gas',
            `${formatPercent(c.idealGasDifferencePercent)} in gas power`,
            `variable cp against ${r.basis.equationOfState}`,
          ] as KvRow,
        ]
      : []),
    ['Motor rating, IEC 60072-1', iecText(c.motor.iecKw), pct(c.motor.marginPercent)],
    ['Motor rating, NEMA MG 1', nemaText(c.motor.nemaHp), pct(c.motor.nemaMarginPercent)],
    ['Required motor margin', formatPercent(c.motor.requiredMarginPercent), 'over shaft power, no service factor'],
    ...(c.drive
      ? [
          [
            'Motor input power',
            formatKw(c.drive.inputPowerKw),
            `efficiency ${formatFixed(c.drive.motorEfficiency, 3)}, pf ${formatFixed(c.drive.powerFactor, 2)}`,
          ] as KvRow,
          [
            'Motor line current',
            formatAmps(c.drive.lineCurrentA),
            `${formatRating(c.drive.voltageV)} V, ${c.drive.phases}-phase`,
          ] as KvRow,
        ]
      : []),
    ['Suggested stages', suggestion(c.suggestedStages, c.dischargeTemperatureLimitC)],
    ['Discharge actual flow', `${formatFigure(c.dischargeActualFlowM3PerH)} m³/h`],
  ];
  return [
    headingBlock('3', 'Results: compressor'),
    highlightBlock(
      'ch',
      [
        { label: 'Shaft power', value: formatKw(c.shaftPowerKw) },
        { label: 'Gas power', value: formatKw(c.gasPowerKw) },
        { label: 'Motor (IEC)', value: iecText(c.motor.iecKw) },
        { label: 'Motor (NEMA)', value: nemaText(c.motor.nemaHp) },
      ],
      colors.tide,
    ),
    caption('cs', `Stage stream table, ${methodLabel(c.basis)} (headline basis)`),
    ...stageStreamBlocks(c),
    caption('cw', 'Stage heads, efficiencies, work and coolers (Hs isentropic, Hp polytropic head)'),
    ...stageTableBlocks(c),
    caption('cm', c.realGas ? 'Real gas beside the ideal-gas methods' : 'Both ideal-gas methods'),
    ...methodBlocks(c),
    caption('cr', 'Power and drive'),
    ...kvBlocks('cr', rows),
  ];
}
