import type { SizingInput } from '@/lib/engine';
import { GAS_PRESETS } from '@/lib/thermo';
import { unitLabel } from '@/lib/units';

const qty = (q: { value: number; unit: string } | undefined) => (q ? `${q.value} ${unitLabel(q.unit)}` : '—');

function gasText(g: SizingInput['gas']): string {
  if (g.components) {
    const parts = Object.entries(g.components)
      .map(([k, v]) => `${k} ${v}`)
      .join(', ');
    return `Mixture (${g.basis ?? 'mole'} fractions): ${parts}`;
  }
  const name = GAS_PRESETS.find((p) => p.id === g.preset)?.displayName ?? g.preset ?? '—';
  if (g.relativeHumidityPercent !== undefined) return `${name}, ${g.relativeHumidityPercent} % RH`;
  if (g.dewPoint) return `${name}, dew point ${qty(g.dewPoint)}`;
  return name;
}

function rows(input: SizingInput): [string, string][] {
  const common: [string, string][] = [
    ['Gas', gasText(input.gas)],
    ['Flow', qty(input.flow)],
    [
      input.service === 'compressor' ? 'Suction' : 'Inlet',
      `${qty(input.inlet.temperature)} at ${qty(input.inlet.pressure)}`,
    ],
    ['Site barometric', qty(input.site?.barometricPressure)],
  ];
  const supply: [string, string] = [
    'Supply',
    input.supply ? `${input.supply.voltageV} V, ${input.supply.phases === 3 ? 'three' : 'single'}-phase` : '—',
  ];
  if (input.service === 'heater') {
    return [
      ['Service', 'Electric process gas heater'],
      ...common,
      ['Outlet', qty(input.outletTemperature)],
      ['Allowances', `heat loss ${input.heatLossPercent} %, design margin ${input.designMarginPercent} %`],
      supply,
      ['Catalogue', input.heaterRatingsKw ? `${input.heaterRatingsKw.length} ratings given` : 'Dutywise standard list'],
    ];
  }
  const eta =
    input.isentropicEfficiency !== undefined
      ? `isentropic ${input.isentropicEfficiency}`
      : `polytropic ${input.polytropicEfficiency}`;
  return [
    ['Service', `Gas compressor, ${input.stages} stage${input.stages > 1 ? 's' : ''}`],
    ...common,
    ['Discharge', qty(input.dischargePressure)],
    ['Stage efficiency', `${eta}; mechanical ${input.mechanicalEfficiency}`],
    [
      'Intercooling',
      `${input.intercoolerOutletTemperature ? qty(input.intercoolerOutletTemperature) : 'to suction temperature'}, ${input.interstagePressureDropPercent} % drop`,
    ],
    [
      'Discharge limit',
      input.dischargeTemperatureLimit ? qty(input.dischargeTemperatureLimit) : 'default (150 °C; 135 °C hydrogen-rich)',
    ],
    ['Headline method', input.method],
    supply,
  ];
}

/** The duty point in words and canonical units; printed with the result. */
export function DutyPointTable({ input }: { input: SizingInput }) {
  return (
    <table className="w-full text-sm" data-testid="duty-point">
      <caption className="sr-only">Duty point</caption>
      <tbody>
        {rows(input).map(([k, v]) => (
          <tr key={k} className="border-t border-paper-line first:border-t-0">
            <th scope="row" className="w-40 py-1.5 pr-3 text-left align-top font-medium text-ink-soft">
              {k}
            </th>
            <td className="py-1.5 font-mono text-xs leading-5">{v}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
