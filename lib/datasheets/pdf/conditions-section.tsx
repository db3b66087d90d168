/** @jsxRuntime automatic @jsxImportSource react */
import { enteredConditions, type EnteredConditions } from '../entered-input';
import {
  formatActualM3PerH,
  formatEntered,
  formatFigure,
  formatFixed,
  formatKgPerH,
  formatKgPerS,
  formatKpa,
  formatPercent,
  formatRating,
  formatTemperatureC,
  formatTemperatureDifferenceK,
} from '../format';
import type { DatasheetSnapshot } from '../snapshot';
import { headingBlock, kvBlocks, type Block, type KvRow } from './blocks';

function heaterRows(s: DatasheetSnapshot, e: EnteredConditions): KvRow[] {
  if (s.result.service !== 'heater') return [];
  const h = s.result.heater;
  return [
    ['Outlet temperature (target)', formatEntered(e.outletTemperature), formatTemperatureC(h.outletTemperatureC)],
    ['Temperature rise', formatTemperatureDifferenceK(h.temperatureRiseK)],
    ['Heat-loss allowance', formatPercent(h.heatLossPercent)],
    ['Design margin', formatPercent(h.designMarginPercent)],
    ['Supply', `${formatRating(h.electrical.voltageV)} V, ${h.electrical.phases}-phase`],
  ];
}

function compressorRows(s: DatasheetSnapshot, e: EnteredConditions): KvRow[] {
  if (s.result.service !== 'compressor') return [];
  const c = s.result.compressor;
  const eff: KvRow =
    e.polytropicEfficiency !== null || c.polytropicEfficiency !== null
      ? [
          'Polytropic efficiency per stage',
          formatFixed(c.polytropicEfficiency ?? e.polytropicEfficiency ?? NaN, 3),
          `isentropic equivalent ${formatFixed(c.isentropicEfficiency, 4)}`,
        ]
      : ['Isentropic efficiency per stage', formatFixed(c.isentropicEfficiency, 3)];
  return [
    ['Discharge pressure (target)', formatEntered(e.dischargePressure), formatKpa(c.dischargePressureKpa)],
    [
      'Overall pressure ratio',
      formatFixed(c.overallPressureRatio, 3),
      `${c.stageCount} stage(s) of ${formatFixed(c.stagePressureRatio, 3)}`,
    ],
    eff,
    [
      'Intercooler outlet temperature',
      formatTemperatureC(c.intercoolerOutletTemperatureC),
      e.intercoolerOutletTemperature
        ? `entered ${formatEntered(e.intercoolerOutletTemperature)}`
        : 'suction temperature (default)',
    ],
    ['Interstage pressure drop', formatPercent(c.interstagePressureDropPercent)],
    ['Mechanical efficiency', formatFixed(c.mechanicalEfficiency, 3)],
    ['Discharge temperature limit', formatTemperatureC(c.dischargeTemperatureLimitC)],
  ];
}

/** The duty point: flow as entered beside mass and standard flows, inlet state, and the target. */
export function conditionsBlocks(s: DatasheetSnapshot): Block[] {
  const r = s.result;
  const e = enteredConditions(s.input);
  const rows: KvRow[] = [
    ['Flow as entered', formatEntered(e.flow)],
    ['Mass flow', formatKgPerH(r.massFlowKgPerS * 3600), formatKgPerS(r.massFlowKgPerS)],
    [
      'Standard flows',
      `${formatFigure(r.flows.normalM3PerH)} Nm³/h`,
      `${formatFigure(r.flows.standardM3PerH)} Sm³/h, ${formatFigure(r.flows.scfm)} SCFM`,
    ],
    ['Inlet actual flow', formatActualM3PerH(r.inletActualFlowM3PerH)],
    ['Inlet temperature', formatEntered(e.inletTemperature), formatTemperatureC(r.inletTemperatureC)],
    ['Inlet pressure', formatEntered(e.inletPressure), formatKpa(r.inletPressureKpa)],
    ...heaterRows(s, e),
    ...compressorRows(s, e),
  ];
  return [headingBlock('2', 'Operating conditions'), ...kvBlocks('c', rows)];
}
