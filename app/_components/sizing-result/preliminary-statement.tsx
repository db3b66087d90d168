import type { SizingResult } from '@/lib/engine';
import { FALLBACK_PRELIMINARY, preliminaryOf } from './severity';
import { SeverityIcon } from './severity-icon';

/** The statement every result carries: preliminary, to be confirmed under local codes. */
export function PreliminaryStatement({ result }: { result: SizingResult | null }) {
  return (
    <p
      data-testid="preliminary-statement"
      className="flex gap-2 rounded-md border border-severity-caution/30 bg-paper px-3 py-2 text-hint text-ink-soft"
    >
      <SeverityIcon severity="caution" className="mt-px h-3.5 w-3.5" />
      <span>{result ? preliminaryOf(result) : FALLBACK_PRELIMINARY}</span>
    </p>
  );
}
