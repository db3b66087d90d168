'use client';

import {
  Bar,
  BarChart,
  CartesianGrid,
  Cell,
  LabelList,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { fixed } from '@/app/_components/sizing-result/quantity-format';
import { ChartKey } from './chart-key';
import { CHART, axisLabel, axisTick } from './chart-theme';
import type { StageChartData } from './compressor-stages';

/** Per stage, side by side: discharge temperature against the limit (hatched when over) and gas power. */
export function StageChart({ data }: { data: StageChartData }) {
  const u = data.temperatureUnit;
  const over = data.bars.filter((b) => b.overLimit).map((b) => b.stage);
  const top = Math.max(data.limitT, ...data.bars.map((b) => b.dischargeT));
  return (
    <figure data-testid="chart-stages" className="break-inside-avoid">
      <div
        role="img"
        aria-label={`Discharge temperature and power per stage; limit ${fixed(data.limitT, 1)} ${u}${over.length ? `; stages ${over.join(', ')} over the limit` : '; every stage within the limit'}.`}
        className="h-72 w-full"
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data.bars} margin={{ top: 22, right: 30, bottom: 30, left: 30 }} barGap={4}>
            <defs>
              <pattern id="stage-power-dots" width="5" height="5" patternUnits="userSpaceOnUse">
                <rect width="5" height="5" fill={CHART.ink} fillOpacity="0.06" />
                <circle cx="2.5" cy="2.5" r="1.1" fill={CHART.ink} />
              </pattern>
              <pattern
                id="over-limit-hatch"
                width="6"
                height="6"
                patternUnits="userSpaceOnUse"
                patternTransform="rotate(45)"
              >
                <rect width="6" height="6" fill={CHART.warning} fillOpacity="0.25" />
                <line x1="0" y1="0" x2="0" y2="6" stroke={CHART.warning} strokeWidth="3" />
              </pattern>
            </defs>
            <CartesianGrid stroke={CHART.grid} strokeDasharray="2 4" vertical={false} />
            <XAxis dataKey="label" tick={axisTick} label={axisLabel('Stage', 'x')} />
            <YAxis
              yAxisId="t"
              domain={[0, Math.ceil(top * 1.15)]}
              tick={axisTick}
              width={54}
              label={axisLabel(`Discharge temperature, ${u}`, 'y')}
            />
            <YAxis
              yAxisId="p"
              orientation="right"
              domain={[0, (max: number) => Math.ceil(max * 1.15)]}
              tick={axisTick}
              width={54}
              label={axisLabel('Gas power, kW', 'y2')}
            />
            <Bar yAxisId="t" dataKey="dischargeT" name={`Discharge, ${u}`} isAnimationActive={false} maxBarSize={56}>
              {data.bars.map((b) => (
                <Cell
                  key={b.stage}
                  fill={b.overLimit ? 'url(#over-limit-hatch)' : CHART.tideSoft}
                  stroke={b.overLimit ? CHART.warning : CHART.tide}
                />
              ))}
              <LabelList
                dataKey="dischargeT"
                position="top"
                formatter={(v) => fixed(Number(v), 1)}
                style={{ fontSize: 11, fill: CHART.ink }}
              />
            </Bar>
            <Bar
              yAxisId="p"
              dataKey="powerKw"
              name="Gas power, kW"
              fill="url(#stage-power-dots)"
              stroke={CHART.ink}
              isAnimationActive={false}
              maxBarSize={56}
            >
              <LabelList
                dataKey="powerKw"
                position="top"
                formatter={(v) => fixed(Number(v), 1)}
                style={{ fontSize: 11, fill: CHART.muted }}
              />
            </Bar>
            <ReferenceLine yAxisId="t" y={data.limitT} stroke={CHART.warning} strokeWidth={1.5} strokeDasharray="8 4" />
            <Tooltip formatter={(v) => fixed(Number(v), 1)} />
          </BarChart>
        </ResponsiveContainer>
      </div>
      <ChartKey
        items={[
          { label: `Discharge temperature (${data.basis})`, stroke: CHART.tideSoft, bar: true },
          { label: 'over the limit (hatched)', stroke: CHART.warning, area: true },
          { label: `Discharge limit ${fixed(data.limitT, 1)} ${u}`, stroke: CHART.warning, dash: '8 4' },
          { label: 'Gas power per stage, kW (dotted, right axis)', stroke: CHART.ink, area: true },
        ]}
      />
    </figure>
  );
}
