'use client';

import { DutyPointTable } from '@/app/_components/sizing-result/duty-point-table';
import type { SizingInput } from '@/lib/engine';
import type { DeskIssues } from '../_lib/field-paths';
import { DESK_STEPS } from '../_lib/steps';
import { CopyButton } from './copy-button';
import { IssueList } from './issue-list';
import { StepSection } from './step-section';

type Props = { input: SizingInput | null; issues: DeskIssues | null; accent: 'copper' | 'tide' };

/** Step 6: the duty point as the engine reads it, every open issue, and the request for the API. */
export function ReviewStep({ input, issues, accent }: Props) {
  const json = input ? JSON.stringify(input, null, 2) : '';
  return (
    <StepSection
      step={DESK_STEPS[5]!}
      accent={accent}
      description="What the calculator receives: canonical units, defaults filled in."
    >
      {input ? (
        <div className="space-y-3">
          <p className="text-sm text-tide-700" data-testid="review-ready">
            Ready: the result updates as you type.
          </p>
          <DutyPointTable input={input} />
          <details className="rounded-md border border-paper-line bg-paper-sunk p-3 text-sm">
            <summary className="cursor-pointer font-medium">Request for the calculate API</summary>
            <pre className="mt-2 max-h-72 overflow-auto font-mono text-xs">{json}</pre>
            <CopyButton text={json} label="Copy request JSON" testId="copy-request" />
          </details>
        </div>
      ) : (
        <div className="space-y-2">
          <p className="text-sm font-medium text-severity-danger">These need attention before the duty can be sized:</p>
          {issues && <IssueList issues={issues} testId="review-issues" />}
        </div>
      )}
    </StepSection>
  );
}
