import {
  fixed,
  formatA,
  formatKw,
  formatPercent,
  formatRating,
  showMassFlow,
  showTemperatureDifference,
} from '@/app/_components/sizing-result/quantity-format';
import { SeverityIcon } from '@/app/_components/sizing-result/severity-icon';
import type { HeaterResult } from '@/lib/engine';
import { EQUATION_NAMES } from '@/lib/engine/headline-method';
import type { UnitSystem } from '@/lib/units';
import { KeyFigure, KeyFigures } from './key-figure';

/** Design heater kW with the catalogue rating and current, then the figures behind it. */
export function HeaterHeadline({ result, system }: { result: HeaterResult; system: UnitSystem }) {
  const h = result.heater;
  const e = h.electrical;
  const flagged = Math.abs(h.temperatureRiseK) > 200;
  const rise = showTemperatureDifference(h.temperatureRiseK, system);
  return (
    <>
      <div
        data-testid="result-headline"
        aria-live="polite"
        aria-atomic="true"
        className="rounded-md bg-copper-50 px-4 py-3 text-copper-700"
      >
        <p className="text-label uppercase tracking-wide">Design heater duty</p>
        <p className="text-figure-xl text-ink">
          <span data-testid="result-design-duty-kw" className="font-mono tabular">
            {formatKw(h.designDutyKw)}
          </span>
          <span className="ml-2 text-figure-lg text-ink-soft">kW</span>
        </p>
        <p className="mt-1 text-sm text-ink">
          {h.selectedRatingKw === null ? (
            <span data-testid="result-selected-rating-kw">Above the largest catalogue rating</span>
          ) : (
            <>
              Catalogue rating{' '}
              <strong data-testid="result-selected-rating-kw" className="font-mono">
                {formatRating(h.selectedRatingKw)}
              </strong>{' '}
              kW
            </>
          )}
          {' · '}
          <strong data-testid="result-current-a" className="font-mono">
            {formatA(e.currentA)}
          </strong>{' '}
          A at {fixed(e.voltageV, 0)} V {e.phases === 3 ? '3-phase' : '1-phase'}
        </p>
      </div>
      <KeyFigures>
        <KeyFigure
          label="Absorbed duty"
          value={formatKw(h.absorbedDutyKw)}
          unit="kW"
          testId="result-absorbed-duty-kw"
        />
        <KeyFigure
          label="Average-cp estimate"
          value={formatKw(h.averageCpDutyKw)}
          unit="kW"
          testId="result-average-cp-duty-kw"
          note={
            <span className="inline-flex items-center gap-1">
              {flagged && <SeverityIcon severity="caution" className="h-3 w-3" />}
              {formatPercent(h.averageCpDifferencePercent)} %{flagged ? '; rise over 200 K' : ' vs absorbed'}
            </span>
          }
        />
        <KeyFigure
          label="Mass flow"
          value={showMassFlow(result.massFlowKgPerS, system).value}
          unit={showMassFlow(result.massFlowKgPerS, system).unit}
          testId="result-mass-flow"
        />
        <KeyFigure label="Temperature rise" value={rise.value} unit={rise.unit} />
        <KeyFigure
          label="Continuous current (125 %)"
          value={formatA(e.continuousCurrentA)}
          unit="A"
          testId="result-continuous-current-a"
          note={e.subdivisionRequired ? 'over 48 A: subdivide circuits' : undefined}
        />
        {h.idealGasDifferencePercent !== null && (
          <KeyFigure
            label="Ideal gas vs real gas"
            value={formatPercent(h.idealGasDifferencePercent)}
            unit="%"
            note={`absorbed duty, ${EQUATION_NAMES[result.basis.equationOfState]}; Z in ${fixed(result.inletZ, 4)}`}
            testId="result-ideal-gas-difference"
          />
        )}
        <KeyFigure
          label="Allowances"
          value={`${formatKw(h.heatLossKw + h.marginKw)}`}
          unit="kW"
          note={`loss ${h.heatLossPercent} %, margin ${h.designMarginPercent} %`}
        />
      </KeyFigures>
    </>
  );
}
