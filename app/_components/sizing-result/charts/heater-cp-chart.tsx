'use client';

import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceArea,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { fixed } from '@/app/_components/sizing-result/quantity-format';
import { ChartKey } from './chart-key';
import { CHART, axisLabel, axisTick } from './chart-theme';
import type { HeaterCpChartData } from './heater-cp';

/** cp across the heater's range with the mean-temperature cp, the integrated average and the 200 K band. */
export function HeaterCpChart({ data }: { data: HeaterCpChartData }) {
  const u = data.temperatureUnit;
  const summary = `cp rises from ${fixed(data.points[0]?.cp ?? NaN, 4)} to ${fixed(data.points.at(-1)?.cp ?? NaN, 4)} ${data.cpUnit}; cp at the mean temperature ${fixed(data.meanCp, 4)}, integrated average ${fixed(data.integratedCp, 4)}.`;
  return (
    <figure data-testid="chart-heater-cp" className="break-inside-avoid">
      <div role="img" aria-label={`Chart of cp against temperature. ${summary}`} className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data.points} margin={{ top: 18, right: 20, bottom: 30, left: 30 }}>
            <CartesianGrid stroke={CHART.grid} strokeDasharray="2 4" />
            <ReferenceArea
              x1={data.band.from}
              x2={data.band.to}
              fill={CHART.tideSoft}
              fillOpacity={0.08}
              stroke={CHART.tideSoft}
              strokeDasharray="4 3"
              ifOverflow="hidden"
            />
            <XAxis
              type="number"
              dataKey="t"
              domain={['dataMin', 'dataMax']}
              tick={axisTick}
              tickFormatter={(v: number) => fixed(v, 0)}
              label={axisLabel(`Gas temperature, ${u}`, 'x')}
            />
            <YAxis
              type="number"
              domain={['auto', 'auto']}
              tick={axisTick}
              width={56}
              tickFormatter={(v: number) => fixed(v, 3)}
              label={axisLabel(`cp, ${data.cpUnit}`, 'y')}
            />
            <ReferenceLine
              x={data.inletT}
              stroke={CHART.muted}
              label={{ value: 'inlet', position: 'top', fontSize: 11, fill: CHART.ink }}
            />
            <ReferenceLine
              x={data.outletT}
              stroke={CHART.muted}
              label={{ value: 'outlet', position: 'top', fontSize: 11, fill: CHART.ink }}
            />
            <ReferenceLine y={data.meanCp} stroke={CHART.ink} strokeDasharray="7 3" />
            <ReferenceLine y={data.integratedCp} stroke={CHART.muted} strokeDasharray="2 2" />
            <Line
              type="monotone"
              dataKey="cp"
              stroke={CHART.copper}
              strokeWidth={2.5}
              dot={false}
              isAnimationActive={false}
              name="cp(T)"
            />
            <ReferenceDot x={data.meanT} y={data.meanCp} r={4} fill="white" stroke={CHART.ink} strokeWidth={1.6} />
            <Tooltip formatter={(v) => fixed(Number(v), 4)} labelFormatter={(t) => `${fixed(Number(t), 1)} ${u}`} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <ChartKey
        items={[
          { label: 'cp(T), NASA polynomials', stroke: CHART.copper },
          {
            label: `cp at mean ${fixed(data.meanT, 1)} ${u}: ${fixed(data.meanCp, 4)}`,
            stroke: CHART.ink,
            dash: '7 3',
            marker: 'circle',
          },
          { label: `Δh/ΔT (integrated): ${fixed(data.integratedCp, 4)}`, stroke: CHART.muted, dash: '2 2' },
          { label: '200 K band about the mean', stroke: CHART.tideSoft, area: true },
        ]}
      />
      <figcaption className="mt-1 text-hint text-ink-muted">
        {data.beyondBand
          ? `The rise of ${fixed(data.riseK, 1)} K runs past the 200 K band: the mean-temperature shortcut is not used; the duty integrates cp.`
          : `The rise of ${fixed(data.riseK, 1)} K lies within the 200 K band: the mean-temperature shortcut is a fair hand check here.`}
      </figcaption>
    </figure>
  );
}
