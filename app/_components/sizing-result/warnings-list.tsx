import type { SizingWarning } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { localiseText } from './localise-text';
import { SEVERITY_LABEL, groupWarnings } from './severity';
import { SEVERITY_TEXT, SeverityIcon } from './severity-icon';

const BORDER: Record<string, string> = {
  danger: 'border-l-severity-danger',
  warning: 'border-l-severity-warning',
  caution: 'border-l-severity-caution',
  info: 'border-l-severity-info',
};

/** Warnings and cautions grouped most severe first, each with its severity in words and shape, in the user's units. */
export function WarningsList({ warnings, system }: { warnings: readonly SizingWarning[]; system: UnitSystem }) {
  const groups = groupWarnings(warnings);
  if (!groups.length) return <p className="text-sm text-ink-muted">No warnings beyond the preliminary statement.</p>;
  return (
    <div className="space-y-4" data-testid="warnings">
      {groups.map((g) => (
        <section key={g.severity} aria-label={`${SEVERITY_LABEL[g.severity]} (${g.warnings.length})`}>
          <h3
            className={`mb-1.5 flex items-center gap-1.5 text-label uppercase tracking-wide ${SEVERITY_TEXT[g.severity]}`}
          >
            <SeverityIcon severity={g.severity} />
            {SEVERITY_LABEL[g.severity]} · {g.warnings.length}
          </h3>
          <ul className="space-y-1.5">
            {g.warnings.map((w) => (
              <li
                key={w.code}
                data-testid={`warning-${w.code}`}
                data-severity={w.severity}
                className={`border-l-4 ${BORDER[w.severity]} bg-paper px-3 py-1.5 text-sm text-ink`}
              >
                <span className="sr-only">{SEVERITY_LABEL[w.severity]}: </span>
                {localiseText(w.message, system)}
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}

/** Counts per severity for the side panel. */
export function WarningCounts({ warnings }: { warnings: readonly SizingWarning[] }) {
  const groups = groupWarnings(warnings);
  if (!groups.length) return null;
  return (
    <a href="#result-warnings" className="flex flex-wrap gap-3 text-sm" data-testid="warning-counts">
      {groups.map((g) => (
        <span key={g.severity} className={`inline-flex items-center gap-1 ${SEVERITY_TEXT[g.severity]}`}>
          <SeverityIcon severity={g.severity} />
          <span className="font-medium">{g.warnings.length}</span> {SEVERITY_LABEL[g.severity].toLowerCase()}
          {g.warnings.length > 1 ? 's' : ''}
        </span>
      ))}
      <span className="text-tide-700 underline">see below</span>
    </a>
  );
}
