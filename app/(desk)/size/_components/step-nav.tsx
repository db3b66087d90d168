import type { FieldKey } from '../_lib/field-paths';
import { DESK_STEPS } from '../_lib/steps';

type Props = { errors: Partial<Record<FieldKey, string>>; ready: boolean };

/** The anchored stepper: every section one keystroke away, with the ones that need attention marked. */
export function StepNav({ errors, ready }: Props) {
  return (
    <nav
      aria-label="Sizing steps"
      className="sticky top-0 z-10 -mx-1 mb-4 bg-paper/95 px-1 py-2 backdrop-blur print:hidden"
    >
      <ol className="flex flex-wrap gap-1.5">
        {DESK_STEPS.map((s) => {
          const bad = s.keys.some((k) => errors[k]);
          const reviewOk = s.keys.length === 0 && ready;
          return (
            <li key={s.id}>
              <a
                href={`#${s.id}`}
                data-testid={`step-link-${s.number}`}
                data-state={bad ? 'attention' : 'ok'}
                className={`inline-flex items-center gap-1.5 rounded-full border px-2.5 py-1 text-xs font-medium ${
                  bad
                    ? 'border-severity-danger/40 bg-paper-raised text-severity-danger'
                    : 'border-paper-line bg-paper-raised text-ink-soft hover:text-ink'
                }`}
              >
                <span className="font-mono">{s.number}</span>
                {s.label}
                {bad && (
                  <>
                    <svg viewBox="0 0 10 10" aria-hidden="true" className="h-2.5 w-2.5">
                      <circle cx="5" cy="5" r="4" fill="currentColor" />
                    </svg>
                    <span className="sr-only">(needs attention)</span>
                  </>
                )}
                {reviewOk && (
                  <svg viewBox="0 0 10 10" aria-hidden="true" className="h-2.5 w-2.5 text-tide-600">
                    <path d="M1.5 5.2 4 7.5 8.5 2.5" fill="none" stroke="currentColor" strokeWidth="1.6" />
                  </svg>
                )}
              </a>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
