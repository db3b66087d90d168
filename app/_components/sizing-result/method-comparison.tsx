import type { CompressionMethodResult, CompressorBlock } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { fixed, formatKw, formatPercent, joined, showTemperature } from './quantity-format';

const hottest = (m: CompressionMethodResult) => Math.max(...m.stages.map((s) => s.dischargeTemperatureC));

/** Constant-k and variable-cp side by side, with the difference of each figure. */
export function MethodComparison({ c, system }: { c: CompressorBlock; system: UnitSystem }) {
  const k = c.constantK;
  const v = c.variableCp;
  const t = (x: number) => joined(showTemperature(x, system));
  const dT = hottest(k) - hottest(v);
  const rows: [string, string, string, string][] = [
    [
      'Gas power',
      `${formatKw(k.gasPowerKw)} kW`,
      `${formatKw(v.gasPowerKw)} kW`,
      `${formatPercent(c.methodDifferencePercent)} %`,
    ],
    [
      'Specific work',
      `${fixed(k.specificWorkKjPerKg, 2)} kJ/kg`,
      `${fixed(v.specificWorkKjPerKg, 2)} kJ/kg`,
      `${formatPercent(((k.specificWorkKjPerKg - v.specificWorkKjPerKg) / v.specificWorkKjPerKg) * 100)} %`,
    ],
    [
      'Hottest discharge',
      t(hottest(k)),
      t(hottest(v)),
      `${fixed(system === 'us' ? dT * 1.8 : dT, 1)} ${system === 'us' ? '°F' : 'K'}`,
    ],
    ['Intercooling, total', `${formatKw(k.totalIntercoolerDutyKw)} kW`, `${formatKw(v.totalIntercoolerDutyKw)} kW`, ''],
    [
      'k, cp at suction',
      `${fixed(k.k, 4)}, ${fixed(k.cpJPerKgK, 1)}`,
      `${fixed(v.k, 4)}, ${fixed(v.cpJPerKgK, 1)}`,
      'J/(kg K)',
    ],
  ];
  const head = (m: string) => (c.basis === m ? ' (headline)' : '');
  return (
    <table className="w-full text-sm" data-testid="method-comparison">
      <caption className="mb-1 text-left text-label uppercase tracking-wide text-ink-muted">Both methods</caption>
      <thead>
        <tr className="text-left text-label text-ink-soft">
          <th scope="col" className="py-1 font-medium">
            Figure
          </th>
          <th scope="col" className="py-1 text-right font-medium">
            Constant k{head('constant-k')}
          </th>
          <th scope="col" className="py-1 text-right font-medium">
            Variable cp{head('variable-cp')}
          </th>
          <th scope="col" className="py-1 text-right font-medium">
            Difference
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([label, a, b, d]) => (
          <tr key={label} className="border-t border-paper-line">
            <th scope="row" className="py-1.5 pr-2 text-left font-normal text-ink-soft">
              {label}
            </th>
            <td className="py-1.5 text-right font-mono tabular">{a}</td>
            <td className="py-1.5 text-right font-mono tabular">{b}</td>
            <td className="py-1.5 text-right font-mono tabular text-ink-soft">{d}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
