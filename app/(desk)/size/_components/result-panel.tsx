import { PreliminaryStatement } from '@/app/_components/sizing-result/preliminary-statement';
import { WarningCounts } from '@/app/_components/sizing-result/warnings-list';
import type { UnitSystem } from '@/lib/units';
import { failureText } from '../_lib/calculate-client';
import type { DeskIssues } from '../_lib/field-paths';
import { CompressorHeadline } from './compressor-headline';
import { HeaterHeadline } from './heater-headline';
import { IssueList } from './issue-list';
import type { LiveResult } from './use-live-result';

type Props = { live: LiveResult; issues: DeskIssues | null; system: UnitSystem };

const STATE_LABEL = {
  invalid: 'Waiting for valid inputs',
  computing: 'Computing…',
  recomputing: 'Recomputing…',
  ready: 'Up to date',
  error: 'Not sized',
} as const;

/** The live answer beside the form: headline and key figures, or why there is none yet. */
export function ResultPanel({ live, issues, system }: Props) {
  const { state, result, failure } = live;
  const busy = state === 'computing' || state === 'recomputing';
  return (
    <section
      aria-labelledby="result-title"
      data-testid="result-panel"
      data-state={state}
      aria-busy={busy}
      className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel"
    >
      <div className="mb-3 flex items-center justify-between gap-2">
        <h2 id="result-title" className="text-base font-semibold">
          Result
        </h2>
        <span
          data-testid="result-state"
          className={`inline-flex items-center gap-1.5 text-hint ${state === 'ready' ? 'text-tide-700' : state === 'error' || state === 'invalid' ? 'text-severity-danger' : 'text-ink-muted'}`}
        >
          {busy && <span aria-hidden="true" className="h-2 w-2 animate-pulse rounded-full bg-tide-500" />}
          {STATE_LABEL[state]}
        </span>
      </div>
      {state === 'invalid' && (
        <div className="space-y-2" data-testid="result-invalid">
          <p className="text-sm text-ink-soft">No result while these fields need attention:</p>
          {issues && <IssueList issues={issues} testId="result-issues" />}
        </div>
      )}
      {state === 'error' && failure && (
        <div
          role="alert"
          data-testid="result-error"
          className="space-y-2 rounded-md border border-severity-danger/30 bg-copper-50 px-3 py-2 text-sm text-severity-danger"
        >
          <p>{failureText(failure)}</p>
          {failure.kind === 'input' && (
            <ul className="list-disc pl-5">
              {failure.issues.map((i) => (
                <li key={`${i.path}${i.message}`}>
                  {i.path ? `${i.path}: ` : ''}
                  {i.message}
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
      {state === 'computing' && <div className="h-32 animate-pulse rounded-md bg-paper-sunk" aria-hidden="true" />}
      {result && (
        <div className={`space-y-4 transition-opacity ${state === 'recomputing' ? 'opacity-55' : ''}`}>
          {result.service === 'heater' ? (
            <HeaterHeadline result={result} system={system} />
          ) : (
            <CompressorHeadline result={result} system={system} />
          )}
          <WarningCounts warnings={result.warnings} />
        </div>
      )}
      <div className="mt-4">
        <PreliminaryStatement result={result} />
      </div>
    </section>
  );
}
