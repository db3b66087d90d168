import type { ReactNode } from 'react';
import type { DeskStep } from '../_lib/steps';

type Props = { step: DeskStep; description: ReactNode; accent: 'copper' | 'tide'; children: ReactNode };

/** One numbered section of the desk form; the stepper links to its id. */
export function StepSection({ step, description, accent, children }: Props) {
  const headingId = `${step.id}-title`;
  const bar = accent === 'copper' ? 'border-l-copper-500' : 'border-l-tide-500';
  return (
    <section
      id={step.id}
      aria-labelledby={headingId}
      className={`@container scroll-mt-20 rounded-panel border border-l-4 border-paper-line ${bar} bg-paper-raised p-panel shadow-panel`}
    >
      <header className="mb-4 flex items-baseline gap-3">
        <span
          aria-hidden="true"
          className="inline-flex h-6 w-6 shrink-0 items-center justify-center rounded-full bg-ink text-xs font-semibold text-paper"
        >
          {step.number}
        </span>
        <div>
          <h2 id={headingId} className="text-base font-semibold text-ink">
            <span className="sr-only">Step {step.number}: </span>
            {step.label}
          </h2>
          <p className="text-hint text-ink-muted">{description}</p>
        </div>
      </header>
      {children}
    </section>
  );
}

/** Fields side by side where the section is wide enough. */
export function FieldGrid({ children }: { children: ReactNode }) {
  return <div className="grid gap-x-5 gap-y-4 @lg:grid-cols-2">{children}</div>;
}
