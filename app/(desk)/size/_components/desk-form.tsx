'use client';

import type { SizingInput } from '@/lib/engine';
import type { DeskIssues, FieldKey } from '../_lib/field-paths';
import { FlowStep } from './flow-step';
import { GasStep } from './gas-step';
import { OptionsStep } from './options-step';
import { ReviewStep } from './review-step';
import { ServiceStep } from './service-step';
import { StepNav } from './step-nav';
import { TargetStep } from './target-step';

type Props = {
  errors: Partial<Record<FieldKey, string>>;
  ready: boolean;
  input: SizingInput | null;
  issues: DeskIssues | null;
  accent: 'copper' | 'tide';
  accountChoice: 'pick' | 'fixed' | 'none';
  fixedAccountName: string | null;
};

/** The six steps on one page, in tab order, with the stepper above them. */
export function DeskForm({ errors, ready, input, issues, accent, accountChoice, fixedAccountName }: Props) {
  return (
    <div className="min-w-0 print:hidden">
      <StepNav errors={errors} ready={ready} />
      <form
        noValidate
        onSubmit={(e) => e.preventDefault()}
        aria-label="Duty point"
        className="space-y-4"
        data-testid="desk-form"
      >
        <ServiceStep accountChoice={accountChoice} fixedAccountName={fixedAccountName} />
        <GasStep />
        <FlowStep />
        <TargetStep />
        <OptionsStep />
        <ReviewStep input={input} issues={issues} accent={accent} />
      </form>
    </div>
  );
}
