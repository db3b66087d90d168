'use client';

import dynamic from 'next/dynamic';
import { memo } from 'react';
import type { SizingInput, SizingResult } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { BasisPanel } from './basis-panel';
import { DriveTable } from './drive-table';
import { DutyPointTable } from './duty-point-table';
import { DetailCard } from './figure-table';
import { FlowsTable } from './flows-table';
import { HeaterBreakdown } from './heater-breakdown';
import { MethodComparison } from './method-comparison';
import { PreliminaryStatement } from './preliminary-statement';
import { StageTable } from './stage-table';
import { WarningsList } from './warnings-list';

// The charts (recharts, and the sizing engine the stage sweep runs) load after the page, only where a result
// is shown: they sit below the figures and would otherwise more than double the page's first-load JavaScript.
const ResultCharts = dynamic(() => import('./charts/result-charts').then((m) => m.ResultCharts), { ssr: false });

type Figures = { result: SizingResult; input: SizingInput; system: UnitSystem };

/** The full breakdown under the form: figures, pictures, warnings and basis; printable on its own. */
export function ResultDetails({ stale, ...figures }: Figures & { stale: boolean }) {
  // Dimming a result that is being recomputed must not redraw the tables and charts: only the frame changes.
  return (
    <div
      data-testid="result-details"
      className={`mt-6 grid gap-6 transition-opacity xl:grid-cols-2 print:mt-0 print:block print:space-y-4 ${stale ? 'opacity-55' : ''}`}
    >
      <DetailCards {...figures} />
    </div>
  );
}

const DetailCards = memo(function DetailCards({ result, input, system }: Figures) {
  return (
    <>
      <DetailCard title="Duty point" id="detail-duty-point" className="hidden print:block">
        <DutyPointTable input={input} />
      </DetailCard>
      {result.service === 'heater' ? (
        <DetailCard title="Heater breakdown" id="detail-heater" className="xl:col-span-2">
          <HeaterBreakdown result={result} system={system} />
        </DetailCard>
      ) : (
        <>
          <DetailCard title="Stage stream table" id="detail-stages" className="xl:col-span-2">
            <StageTable c={result.compressor} system={system} />
          </DetailCard>
          <DetailCard title="Methods compared" id="detail-methods">
            <MethodComparison c={result.compressor} system={system} equation={result.basis.equationOfState} />
          </DetailCard>
          <DetailCard title="Driver and motor" id="detail-drive">
            <DriveTable c={result.compressor} />
          </DetailCard>
        </>
      )}
      <ResultCharts result={result} input={input} system={system} />
      <DetailCard title="Warnings and cautions" id="result-warnings">
        <WarningsList warnings={result.warnings} system={system} />
      </DetailCard>
      <DetailCard title="Flows and gas" id="detail-flows">
        <FlowsTable result={result} system={system} />
      </DetailCard>
      <DetailCard title="Basis" id="detail-basis" className="xl:col-span-2">
        <BasisPanel basis={result.basis} engineVersion={result.engineVersion} />
        <div className="mt-3">
          <PreliminaryStatement result={result} />
        </div>
      </DetailCard>
    </>
  );
});
