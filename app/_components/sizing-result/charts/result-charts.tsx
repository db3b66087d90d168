'use client';

import { useMemo } from 'react';
import type { SizingInput, SizingResult } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { DetailCard } from '../figure-table';
import { stageChart } from './compressor-stages';
import { heaterCpChart } from './heater-cp';
import { HeaterCpChart } from './heater-cp-chart';
import { StageChart } from './stage-chart';
import { stageSweep } from './stage-sweep';
import { SweepChart } from './sweep-chart';

/** The pictures: cp across a heater's range, or a compressor's stages and its 1-6 stage sweep. */
export function ResultCharts({
  result,
  input,
  system,
}: {
  result: SizingResult;
  input: SizingInput;
  system: UnitSystem;
}) {
  const cp = useMemo(() => (result.service === 'heater' ? heaterCpChart(result, system) : null), [result, system]);
  const stages = useMemo(() => (result.service === 'compressor' ? stageChart(result, system) : null), [result, system]);
  const sweep = useMemo(() => (input.service === 'compressor' ? stageSweep(input, system) : null), [input, system]);
  if (cp) {
    return (
      <DetailCard title="cp across the heater" id="chart-cp-title" className="xl:col-span-2">
        <HeaterCpChart data={cp} />
      </DetailCard>
    );
  }
  return (
    <>
      {stages && (
        <DetailCard title="Per stage: discharge temperature and power" id="chart-stages-title">
          <StageChart data={stages} />
        </DetailCard>
      )}
      {sweep && (
        <DetailCard title="One to six stages" id="chart-sweep-title">
          <SweepChart data={sweep} />
        </DetailCard>
      )}
    </>
  );
}
