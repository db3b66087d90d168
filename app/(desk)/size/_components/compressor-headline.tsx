import {
  fixed,
  formatHp,
  formatKw,
  formatPercent,
  joined,
  showTemperature,
} from '@/app/_components/sizing-result/quantity-format';
import { SeverityIcon } from '@/app/_components/sizing-result/severity-icon';
import type { CompressorResult } from '@/lib/engine';
import { EQUATION_NAMES, METHOD_NAMES, headlineMethod } from '@/lib/engine/headline-method';
import type { UnitSystem } from '@/lib/units';
import { KeyFigure, KeyFigures } from './key-figure';

/** Shaft power with the IEC and NEMA motor ratings, then the figures behind it. */
export function CompressorHeadline({ result, system }: { result: CompressorResult; system: UnitSystem }) {
  const c = result.compressor;
  const method = headlineMethod(c);
  const hottest = Math.max(...method.stages.map((s) => s.dischargeTemperatureC));
  const over = hottest > c.dischargeTemperatureLimitC + 1e-9;
  const hot = showTemperature(hottest, system);
  return (
    <>
      <div
        data-testid="result-headline"
        aria-live="polite"
        aria-atomic="true"
        className="rounded-md bg-tide-50 px-4 py-3 text-tide-700"
      >
        <p className="text-label uppercase tracking-wide">
          Shaft power · {c.stageCount} stage{c.stageCount > 1 ? 's' : ''}, {METHOD_NAMES[c.basis]}
          {c.realGas ? ` (${EQUATION_NAMES[result.basis.equationOfState]})` : ''}
        </p>
        <p className="text-figure-xl text-ink">
          <span data-testid="result-shaft-power-kw" className="font-mono tabular">
            {formatKw(c.shaftPowerKw)}
          </span>
          <span className="ml-2 text-figure-lg text-ink-soft">kW</span>
        </p>
        <p className="font-mono text-sm text-ink-soft" data-testid="result-shaft-power-hp">
          {formatHp(c.shaftPowerKw)} hp
        </p>
        <p className="mt-1 text-sm text-ink">
          Motor{' '}
          {c.motor.iecKw === null ? (
            'above the IEC series'
          ) : (
            <>
              IEC{' '}
              <strong data-testid="result-motor-iec-kw" className="font-mono">
                {c.motor.iecKw}
              </strong>{' '}
              kW
            </>
          )}
          {' / '}
          {c.motor.nemaHp === null ? (
            'above the NEMA series'
          ) : (
            <>
              NEMA{' '}
              <strong data-testid="result-motor-nema-hp" className="font-mono">
                {c.motor.nemaHp}
              </strong>{' '}
              hp
            </>
          )}
          <span className="text-ink-soft"> (≥ {c.motor.requiredMarginPercent} % over shaft)</span>
        </p>
      </div>
      <KeyFigures>
        <KeyFigure label="Gas power" value={formatKw(c.gasPowerKw)} unit="kW" testId="result-gas-power-kw" />
        <KeyFigure
          label="Ratio per stage"
          value={fixed(c.stagePressureRatio, 3)}
          note={`overall ${fixed(c.overallPressureRatio, 2)}`}
          testId="result-stage-ratio"
        />
        <KeyFigure
          label="Hottest discharge"
          value={hot.value}
          unit={hot.unit}
          testId="result-max-discharge-temperature"
          note={
            <span className="inline-flex items-center gap-1">
              {over && <SeverityIcon severity="warning" className="h-3 w-3" />}
              {over ? 'over' : 'within'} the {joined(showTemperature(c.dischargeTemperatureLimitC, system))} limit
            </span>
          }
        />
        <KeyFigure
          label="Stages to meet the limit"
          value={c.suggestedStages === null ? 'none ≤ 6' : String(c.suggestedStages)}
          testId="result-suggested-stages"
        />
        <KeyFigure label="Intercooling, total" value={formatKw(method.totalIntercoolerDutyKw)} unit="kW" />
        {c.idealGasDifferencePercent !== null ? (
          <KeyFigure
            label="Ideal gas vs real gas"
            value={formatPercent(c.idealGasDifferencePercent)}
            unit="%"
            note={`gas power; Z at suction ${fixed(result.inletZ, 4)}`}
            testId="result-ideal-gas-difference"
          />
        ) : (
          <KeyFigure
            label="Constant-k vs variable-cp"
            value={formatPercent(c.methodDifferencePercent)}
            unit="%"
            note="gas power difference"
            testId="result-method-difference"
          />
        )}
      </KeyFigures>
    </>
  );
}
