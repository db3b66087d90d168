import type { BasisInfo } from '@/lib/engine';
import { EQUATION_NAMES } from '@/lib/engine/headline-method';
import { fixed } from './quantity-format';

/** What the figures rest on: property data, composition, site pressure and the conventions used. */
export function BasisPanel({ basis, engineVersion }: { basis: BasisInfo; engineVersion: string }) {
  return (
    <div className="space-y-2 text-sm text-ink-soft" data-testid="basis">
      <p data-testid="basis-equation">
        <span className="font-medium text-ink">Equation of state:</span>{' '}
        {EQUATION_NAMES[basis.equationOfState ?? 'ideal-gas']}
        {basis.equationOfStateReason
          ? ` (${basis.equationOfStateReason})`
          : ' (sized before real-gas properties)'}. {basis.equationOfStateSource}
        {basis.standardVolumeBasis ? `. Standard volumes: ${basis.standardVolumeBasis}.` : '.'}
      </p>
      <p>Ideal-gas data: {basis.propertySource}.</p>
      <p>
        <span className="font-medium text-ink">Gas:</span> {basis.gasComposition}.
      </p>
      <p>
        <span className="font-medium text-ink">Site barometric pressure:</span> {fixed(basis.barometricPressureKpa, 3)}{' '}
        kPa ({basis.barometricPressureSource}).
        {basis.flowInputBasis && (
          <>
            {' '}
            Flow entered in {basis.flowInputBasis.unit} at {basis.flowInputBasis.description}.
          </>
        )}
      </p>
      <ul className="list-disc space-y-0.5 pl-5 text-hint">
        {basis.conventions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      <p className="text-hint text-ink-muted">Engine {engineVersion}</p>
    </div>
  );
}
