import type { MixtureSum } from '../_lib/mixture';

/** "Sum 0.9990: must be 1 ± 0.0001", live, announced politely. */
export function MixtureSumLine({ sum, tolerance }: { sum: MixtureSum; tolerance: number }) {
  const text = !sum.readable ? 'Sum: enter numbers in every row' : `Sum ${sum.sum.toFixed(4)}`;
  return (
    <p
      aria-live="polite"
      data-testid="mixture-sum"
      data-ok={sum.ok}
      className={`font-mono text-sm ${sum.ok ? 'text-tide-700' : 'text-severity-caution'}`}
    >
      {text}
      {sum.readable && !sum.ok && <span className="font-sans"> · must be 1 ± {tolerance}</span>}
      {sum.ok && <span className="font-sans"> · sums to 1</span>}
    </p>
  );
}
