'use client';

import { useState } from 'react';
import type { CompressionMethodResult, CompressorBlock, CompressorStage } from '@/lib/engine';
import { METHOD_NAMES, headlineMethod } from '@/lib/engine/headline-method';
import { KG_PER_LB, M3_PER_FT3, type UnitSystem } from '@/lib/units';
import { figure, fixed, formatKw, showPressure, showTemperature } from './quantity-format';
import { SeverityIcon } from './severity-icon';

type MethodKey = 'realGas' | 'variableCp' | 'constantK';
const KEY_OF: Record<CompressorBlock['basis'], MethodKey> = {
  'real-gas': 'realGas',
  'variable-cp': 'variableCp',
  'constant-k': 'constantK',
};
const LABEL: Record<MethodKey, string> = {
  realGas: METHOD_NAMES['real-gas'],
  variableCp: METHOD_NAMES['variable-cp'],
  constantK: METHOD_NAMES['constant-k'],
};
const FT_PER_M = 1 / 0.3048;

/** Columns of the stream table in the user's units. */
function columnsFor(system: UnitSystem, c: CompressorBlock) {
  const tu = showTemperature(0, system).unit;
  const pu = showPressure(100, system).unit;
  const us = system === 'us';
  const density = (st: CompressorStage) =>
    us ? fixed(st.inletDensityKgPerM3 / (KG_PER_LB / M3_PER_FT3), 4) : figure(st.inletDensityKgPerM3);
  const cooler = (st: CompressorStage) => {
    if (!st.cooler) return '—';
    const liquid = st.cooler.condensateKgPerH;
    const flow = us ? `${figure(liquid / KG_PER_LB)} lb/h` : `${figure(liquid)} kg/h`;
    return `${formatKw(st.cooler.dutyKw)}${st.cooler.kind === 'aftercooler' ? ' (after)' : ''}${liquid > 0 ? ` · ${flow} liquid` : ''}`;
  };
  return [
    { head: `p in, ${pu}`, cell: (st: CompressorStage) => showPressure(st.inletPressureKpa, system).value },
    { head: `p out, ${pu}`, cell: (st: CompressorStage) => showPressure(st.dischargePressureKpa, system).value },
    { head: 'Ratio', cell: (st: CompressorStage) => fixed(st.pressureRatio, 3) },
    { head: `T in, ${tu}`, cell: (st: CompressorStage) => showTemperature(st.inletTemperatureC, system).value },
    { head: `T out, ${tu}`, cell: null },
    { head: 'Z in / out', cell: (st: CompressorStage) => `${fixed(st.inletZ, 4)} / ${fixed(st.dischargeZ, 4)}` },
    { head: us ? 'Density in, lb/ft³' : 'Density in, kg/m³', cell: density },
    {
      head: us ? 'Actual flow in, ACFM' : 'Actual flow in, m³/h',
      cell: (st: CompressorStage) => figure(us ? st.inletActualFlowAcfm : st.inletActualFlowM3PerH),
    },
    {
      head: us ? 'Poly. head, ft' : 'Poly. head, kJ/kg (m)',
      cell: (st: CompressorStage) =>
        us
          ? figure(st.polytropicHeadM * FT_PER_M)
          : `${figure(st.polytropicHeadKjPerKg)} (${figure(st.polytropicHeadM)})`,
    },
    {
      head: 'ηs / ηp',
      cell: (st: CompressorStage) => `${fixed(st.isentropicEfficiency, 3)} / ${fixed(st.polytropicEfficiency, 3)}`,
    },
    { head: 'n', cell: (st: CompressorStage) => fixed(st.polytropicExponent, 3) },
    { head: 'Power, kW', cell: null },
    { head: c.stageCount > 1 ? 'Cooler after, kW' : 'Aftercooler, kW', cell: cooler },
  ];
}

function Row({
  st,
  c,
  system,
  headline,
}: {
  st: CompressorStage;
  c: CompressorBlock;
  system: UnitSystem;
  headline: boolean;
}) {
  const over = st.dischargeTemperatureC > c.dischargeTemperatureLimitC + 1e-9;
  const ids = headline; // test ids only on the headline method's rows
  return (
    <tr data-testid={ids ? `stage-row-${st.stage}` : undefined} className="border-t border-paper-line text-right">
      <th scope="row" className="py-1.5 text-left font-sans font-medium">
        {st.stage}
      </th>
      {columnsFor(system, c).map((col) => {
        if (col.head.startsWith('T out')) {
          return (
            <td key={col.head} className={`py-1.5 ${over ? 'font-semibold text-severity-warning' : ''}`}>
              <span className="inline-flex items-center justify-end gap-1">
                {over && <SeverityIcon severity="warning" className="h-3 w-3" />}
                <span data-testid={ids ? `stage-${st.stage}-discharge-temperature` : undefined}>
                  {showTemperature(st.dischargeTemperatureC, system).value}
                </span>
                {over && <span className="sr-only">(over the limit)</span>}
              </span>
            </td>
          );
        }
        if (col.head.startsWith('Power')) {
          return (
            <td key={col.head} className="py-1.5" data-testid={ids ? `stage-${st.stage}-power-kw` : undefined}>
              {formatKw(st.gasPowerKw)}
            </td>
          );
        }
        return (
          <td
            key={col.head}
            className="whitespace-nowrap py-1.5"
            data-testid={ids && col.head.startsWith('Cooler') ? `intercooler-${st.stage}-kw` : undefined}
          >
            {col.cell!(st)}
          </td>
        );
      })}
    </tr>
  );
}

/** The stage stream table of one method (the headline first): states, flows, heads, power and coolers. */
export function StageTable({ c, system }: { c: CompressorBlock; system: UnitSystem }) {
  const headlineKey = KEY_OF[c.basis];
  const [shown, setShown] = useState<MethodKey>(headlineKey);
  const available = (['realGas', 'variableCp', 'constantK'] as const).filter((k) => c[k] !== null);
  const m: CompressionMethodResult = (c[shown] ?? headlineMethod(c)) as CompressionMethodResult;
  const headline = shown === headlineKey;
  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center gap-2 text-sm" role="group" aria-label="Method shown">
        {available.map((k) => (
          <button
            key={k}
            type="button"
            aria-pressed={shown === k}
            data-testid={`stage-method-${k}`}
            onClick={() => setShown(k)}
            className={`rounded-md border px-2.5 py-1 ${shown === k ? 'border-tide-500 bg-tide-50 font-medium text-ink' : 'border-paper-line text-ink-soft'}`}
          >
            {LABEL[k]}
            {k === headlineKey ? ' (headline)' : ''}
          </button>
        ))}
      </div>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[60rem] text-sm" data-testid="stage-table">
          <caption className="mb-1 text-left text-label uppercase tracking-wide text-ink-muted">
            Stages, {LABEL[shown]}
            {m.polytropicSteps ? ` (polytropic path in ${m.polytropicSteps} steps)` : ''}
          </caption>
          <thead>
            <tr className="text-right text-label text-ink-soft">
              <th scope="col" className="py-1 text-left font-medium">
                Stage
              </th>
              {columnsFor(system, c).map((col) => (
                <th key={col.head} scope="col" className="py-1 pl-3 font-medium">
                  {col.head}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="font-mono tabular">
            {m.stages.map((st) => (
              <Row key={st.stage} st={st} c={c} system={system} headline={headline} />
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
