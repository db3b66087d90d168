import type { Severity, SizingResult, SizingWarning } from '@/lib/engine';

/** Most severe first. */
export const SEVERITY_ORDER: readonly Severity[] = ['danger', 'warning', 'caution', 'info'];

export const SEVERITY_LABEL: Readonly<Record<Severity, string>> = {
  danger: 'Danger',
  warning: 'Warning',
  caution: 'Caution',
  info: 'Note',
};

/** Shown when a result somehow lacks the engine's own statement: the sizing is never unqualified. */
export const FALLBACK_PRELIMINARY =
  'Preliminary sizing. Confirm with a qualified engineer under the local codes before purchase or construction.';

/** The engine's preliminary statement for this result. */
export function preliminaryOf(result: SizingResult): string {
  return result.warnings.find((w) => w.code === 'preliminary')?.message ?? FALLBACK_PRELIMINARY;
}

export type WarningGroup = { severity: Severity; warnings: SizingWarning[] };

/** Warnings other than the preliminary statement, grouped most severe first; empty groups left out. */
export function groupWarnings(warnings: readonly SizingWarning[]): WarningGroup[] {
  const rest = warnings.filter((w) => w.code !== 'preliminary');
  return SEVERITY_ORDER.map((severity) => ({ severity, warnings: rest.filter((w) => w.severity === severity) })).filter(
    (g) => g.warnings.length > 0,
  );
}
