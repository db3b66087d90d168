import { formatHp, formatKw } from '@/app/_components/sizing-result/quantity-format';
import type { LiveResult } from './use-live-result';

/**
 * On a phone the result sits below every field; this bar keeps the headline figure in view at the foot of the
 * screen while the fields are edited, and jumps to the full result. Hidden where the result sits beside the form.
 */
export function ResultSummaryBar({ live }: { live: LiveResult }) {
  const { state, result } = live;
  let text = 'Waiting for valid inputs';
  if (result && (state === 'ready' || state === 'recomputing'))
    text =
      result.service === 'heater'
        ? `${formatKw(result.heater.designDutyKw)} kW design duty`
        : `${formatKw(result.compressor.shaftPowerKw)} kW (${formatHp(result.compressor.shaftPowerKw)} hp) shaft power`;
  else if (state === 'computing') text = 'Computing…';
  else if (state === 'error') text = 'Not sized: see the result';
  const warnings = result?.warnings.filter((w) => w.severity === 'warning' || w.severity === 'danger').length ?? 0;
  return (
    <div
      className="fixed inset-x-0 bottom-0 z-20 flex items-center justify-between gap-3 border-t border-paper-line bg-paper-raised/95 px-4 py-2 shadow-panel backdrop-blur lg:hidden print:hidden"
      data-testid="result-summary-bar"
      aria-live="polite"
    >
      <p className="text-sm">
        <span className="font-semibold tabular" data-testid="result-summary-figure">
          {text}
        </span>
        {warnings > 0 && (
          <span className="ml-2 text-severity-warning">
            {warnings} warning{warnings > 1 ? 's' : ''}
          </span>
        )}
      </p>
      <a href="#result-title" className="shrink-0 text-sm text-tide-700 underline">
        Result
      </a>
    </div>
  );
}
