'use client';

import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { fixed, formatKw } from '@/app/_components/sizing-result/quantity-format';
import { ChartKey } from './chart-key';
import { CHART, axisLabel, axisTick } from './chart-theme';
import type { SweepData } from './stage-sweep';

/** Shaft power and the hottest discharge for one to six stages of the same duty. */
export function SweepChart({ data }: { data: SweepData }) {
  const u = data.temperatureUnit;
  const refused = data.points.filter((p) => p.refused);
  return (
    <figure data-testid="chart-sweep" className="break-inside-avoid">
      <div
        role="img"
        aria-label={`Shaft power and hottest discharge temperature for 1 to 6 stages; ${data.suggested ? `${data.suggested} stages meet the limit` : 'no stage count meets the limit'}.`}
        className="h-72 w-full"
      >
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data.points} margin={{ top: 22, right: 30, bottom: 30, left: 30 }}>
            <CartesianGrid stroke={CHART.grid} strokeDasharray="2 4" />
            <XAxis dataKey="stages" tick={axisTick} label={axisLabel('Number of stages', 'x')} />
            <YAxis
              yAxisId="kw"
              tick={axisTick}
              width={56}
              domain={[0, 'auto']}
              label={axisLabel('Shaft power, kW', 'y')}
            />
            <YAxis
              yAxisId="t"
              orientation="right"
              tick={axisTick}
              width={54}
              domain={[0, 'auto']}
              label={axisLabel(`Hottest discharge, ${u}`, 'y2')}
            />
            <ReferenceLine
              yAxisId="kw"
              x={data.selected}
              stroke={CHART.ink}
              label={{ value: 'selected', position: 'top', fontSize: 11, fill: CHART.ink }}
            />
            {data.limitT !== null && (
              <ReferenceLine yAxisId="t" y={data.limitT} stroke={CHART.warning} strokeDasharray="8 4" />
            )}
            <Line
              yAxisId="kw"
              dataKey="shaftPowerKw"
              name="Shaft power, kW"
              stroke={CHART.tide}
              strokeWidth={2.5}
              isAnimationActive={false}
              connectNulls={false}
              dot={{ r: 4, fill: 'white', stroke: CHART.tide, strokeWidth: 2 }}
            />
            <Line
              yAxisId="t"
              dataKey="maxDischargeT"
              name={`Hottest discharge, ${u}`}
              stroke={CHART.copper}
              strokeWidth={2}
              strokeDasharray="5 3"
              isAnimationActive={false}
              dot={{ r: 4, fill: CHART.copper, strokeWidth: 0 }}
            />
            <Tooltip
              formatter={(v) => fixed(Number(v), 1)}
              labelFormatter={(n) => `${n} stage${Number(n) > 1 ? 's' : ''}`}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <ChartKey
        items={[
          { label: 'Shaft power, kW', stroke: CHART.tide, marker: 'circle' },
          { label: `Hottest stage discharge, ${u} (right axis)`, stroke: CHART.copper, dash: '5 3', marker: 'square' },
          {
            label:
              data.limitT === null ? 'Discharge limit' : `Discharge limit ${fixed(data.limitT, 1)} ${u} (right axis)`,
            stroke: CHART.warning,
            dash: '8 4',
          },
        ]}
      />
      <table className="mt-2 w-full text-hint" data-testid="sweep-table">
        <caption className="sr-only">Stage count sweep</caption>
        <thead>
          <tr className="text-ink-muted">
            <th scope="col" className="text-left font-medium">
              Stages
            </th>
            {data.points.map((p) => (
              <th key={p.stages} scope="col" className="text-right font-mono font-medium">
                {p.stages}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="font-mono tabular">
          <tr>
            <th scope="row" className="text-left font-sans font-normal text-ink-soft">
              Shaft, kW
            </th>
            {data.points.map((p) => (
              <td key={p.stages} className="text-right">
                {p.shaftPowerKw === null ? '—' : formatKw(p.shaftPowerKw)}
              </td>
            ))}
          </tr>
          <tr>
            <th scope="row" className="text-left font-sans font-normal text-ink-soft">
              Hottest, {u}
            </th>
            {data.points.map((p) => (
              <td key={p.stages} className="text-right">
                {p.maxDischargeT === null ? '—' : fixed(p.maxDischargeT, 1)}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
      {refused.length > 0 && (
        <p className="mt-1 text-hint text-ink-muted">
          Not sized for {refused.map((p) => p.stages).join(', ')} stage(s): {refused[0]?.refused}
        </p>
      )}
    </figure>
  );
}
