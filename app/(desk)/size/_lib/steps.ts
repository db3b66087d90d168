import type { FieldKey } from './field-paths';

export type DeskStep = { id: string; number: number; label: string; keys: readonly FieldKey[] };

/** The desk's sections in order; `keys` are the fields whose errors mark the step. */
export const DESK_STEPS: readonly DeskStep[] = [
  { id: 'step-service', number: 1, label: 'Service & site', keys: ['service', 'site.barometricPressure'] },
  {
    id: 'step-gas',
    number: 2,
    label: 'Gas',
    keys: ['gas.preset', 'gas.relativeHumidityPercent', 'gas.dewPoint', 'gas.components', 'gas.basis'],
  },
  { id: 'step-flow', number: 3, label: 'Flow & inlet', keys: ['flow', 'inlet.temperature', 'inlet.pressure'] },
  {
    id: 'step-target',
    number: 4,
    label: 'Target',
    keys: [
      'outletTemperature',
      'dischargePressure',
      'stages',
      'efficiency',
      'intercoolerOutletTemperature',
      'interstagePressureDropPercent',
    ],
  },
  {
    id: 'step-options',
    number: 5,
    label: 'Options',
    keys: [
      'heatLossPercent',
      'designMarginPercent',
      'supply.voltageV',
      'supply.phases',
      'heaterRatingsKw',
      'mechanicalEfficiency',
      'method',
      'dischargeTemperatureLimit',
    ],
  },
  { id: 'step-review', number: 6, label: 'Review', keys: [] },
];

/** DOM id of a field's input, so error lists can link straight to it. */
export function inputIdOf(key: FieldKey): string {
  return `desk-${key.replace(/\./g, '-')}`;
}
