import type { BasisInfo, CompressionMethodResult, CompressorBlock } from '@/lib/engine';
import { EQUATION_NAMES } from '@/lib/engine/headline-method';
import type { UnitSystem } from '@/lib/units';
import { fixed, formatKw, formatPercent, joined, showTemperature } from './quantity-format';

const hottest = (m: CompressionMethodResult) => Math.max(...m.stages.map((s) => s.dischargeTemperatureC));

type Props = { c: CompressorBlock; system: UnitSystem; equation?: BasisInfo['equationOfState'] };

/** The methods side by side (real gas first when computed), each with its difference from the headline. */
export function MethodComparison({ c, system, equation }: Props) {
  const methods: [string, CompressionMethodResult, string][] = [
    ...(c.realGas
      ? [
          [`Real gas (${EQUATION_NAMES[equation ?? 'gerg-2008']})`, c.realGas, 'real-gas'] as [
            string,
            CompressionMethodResult,
            string,
          ],
        ]
      : []),
    ['Variable cp', c.variableCp, 'variable-cp'],
    ['Constant k', c.constantK, 'constant-k'],
  ];
  const ref = methods.find(([, , key]) => key === c.basis)![1];
  const t = (x: number) => joined(showTemperature(x, system));
  const dT = (m: CompressionMethodResult) => {
    const d = hottest(m) - hottest(ref);
    return `${d >= 0 ? '+' : ''}${fixed(system === 'us' ? d * 1.8 : d, 1)} ${system === 'us' ? '°F' : 'K'}`;
  };
  const rel = (a: number, b: number) => `${formatPercent(((a - b) / b) * 100)} %`;
  const rows: [string, (m: CompressionMethodResult) => string][] = [
    ['Gas power', (m) => `${formatKw(m.gasPowerKw)} kW`],
    ['vs headline', (m) => (m === ref ? '—' : rel(m.gasPowerKw, ref.gasPowerKw))],
    ['Specific work', (m) => `${fixed(m.specificWorkKjPerKg, 2)} kJ/kg`],
    ['Hottest discharge', (m) => t(hottest(m))],
    ['vs headline', (m) => (m === ref ? '—' : dT(m))],
    ['Intercooling, total', (m) => `${formatKw(m.totalIntercoolerDutyKw)} kW`],
    ['k, cp at suction, J/(kg K)', (m) => `${fixed(m.k, 4)}, ${fixed(m.cpJPerKgK, 1)}`],
  ];
  return (
    <table className="w-full text-sm" data-testid="method-comparison">
      <caption className="mb-1 text-left text-label uppercase tracking-wide text-ink-muted">
        {c.realGas ? 'Real gas and the ideal-gas methods' : 'Both ideal-gas methods'}
      </caption>
      <thead>
        <tr className="text-left text-label text-ink-soft">
          <th scope="col" className="py-1 font-medium">
            Figure
          </th>
          {methods.map(([label, m]) => (
            <th key={label} scope="col" className="py-1 pl-2 text-right font-medium">
              {label}
              {m === ref ? ' (headline)' : ''}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map(([label, cell], i) => (
          <tr key={`${label}-${i}`} className="border-t border-paper-line">
            <th scope="row" className="py-1.5 pr-2 text-left font-normal text-ink-soft">
              {label}
            </th>
            {methods.map(([name, m]) => (
              <td key={name} className="py-1.5 pl-2 text-right font-mono tabular">
                {cell(m)}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
