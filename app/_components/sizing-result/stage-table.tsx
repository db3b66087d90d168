import type { CompressorBlock } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { fixed, formatKw, showPressure, showTemperature } from './quantity-format';
import { SeverityIcon } from './severity-icon';

/** Stage by stage on the headline method, then the intercooler after each stage but the last. */
export function StageTable({ c, system }: { c: CompressorBlock; system: UnitSystem }) {
  const m = c.basis === 'constant-k' ? c.constantK : c.variableCp;
  const tu = showTemperature(0, system).unit;
  const pu = showPressure(100, system).unit;
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[36rem] text-sm" data-testid="stage-table">
        <caption className="mb-1 text-left text-label uppercase tracking-wide text-ink-muted">
          Stages ({c.basis})
        </caption>
        <thead>
          <tr className="text-right text-label text-ink-soft">
            <th scope="col" className="py-1 text-left font-medium">
              Stage
            </th>
            <th scope="col" className="py-1 font-medium">
              p in, {pu}
            </th>
            <th scope="col" className="py-1 font-medium">
              p out, {pu}
            </th>
            <th scope="col" className="py-1 font-medium">
              Ratio
            </th>
            <th scope="col" className="py-1 font-medium">
              T in, {tu}
            </th>
            <th scope="col" className="py-1 font-medium">
              T out, {tu}
            </th>
            <th scope="col" className="py-1 font-medium">
              Power, kW
            </th>
            <th scope="col" className="py-1 font-medium">
              Cooler after, kW
            </th>
          </tr>
        </thead>
        <tbody className="font-mono tabular">
          {m.stages.map((s, i) => {
            const over = s.dischargeTemperatureC > c.dischargeTemperatureLimitC + 1e-9;
            const cooler = m.intercoolerDutiesKw[i];
            return (
              <tr key={s.stage} data-testid={`stage-row-${s.stage}`} className="border-t border-paper-line text-right">
                <th scope="row" className="py-1.5 text-left font-sans font-medium">
                  {s.stage}
                </th>
                <td className="py-1.5">{showPressure(s.inletPressureKpa, system).value}</td>
                <td className="py-1.5">{showPressure(s.dischargePressureKpa, system).value}</td>
                <td className="py-1.5">{fixed(s.pressureRatio, 3)}</td>
                <td className="py-1.5">{showTemperature(s.inletTemperatureC, system).value}</td>
                <td className={`py-1.5 ${over ? 'font-semibold text-severity-warning' : ''}`}>
                  <span className="inline-flex items-center justify-end gap-1">
                    {over && <SeverityIcon severity="warning" className="h-3 w-3" />}
                    <span data-testid={`stage-${s.stage}-discharge-temperature`}>
                      {showTemperature(s.dischargeTemperatureC, system).value}
                    </span>
                    {over && <span className="sr-only">(over the limit)</span>}
                  </span>
                </td>
                <td className="py-1.5" data-testid={`stage-${s.stage}-power-kw`}>
                  {formatKw(s.gasPowerKw)}
                </td>
                <td className="py-1.5" data-testid={`intercooler-${s.stage}-kw`}>
                  {cooler === undefined ? '—' : formatKw(cooler)}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
