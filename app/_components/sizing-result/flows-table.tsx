import type { SizingResult } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { FigureTable, type FigureRow } from './figure-table';
import { figure, fixed, showMassFlow } from './quantity-format';

/** Mass flow and the standard and actual flows it equals, each basis named. */
export function FlowsTable({ result, system }: { result: SizingResult; system: UnitSystem }) {
  const f = result.flows;
  const mass = showMassFlow(result.massFlowKgPerS, system);
  const outlet: FigureRow[] =
    result.service === 'heater'
      ? [{ label: 'Outlet actual flow', value: fixed(result.heater.outletActualFlowM3PerH, 1), unit: 'm³/h' }]
      : [
          {
            label: 'Discharge actual flow',
            value: fixed(result.compressor.dischargeActualFlowM3PerH, 1),
            unit: 'm³/h',
          },
        ];
  const rows: FigureRow[] = [
    { label: 'Mass flow', value: fixed(result.massFlowKgPerS, 4), unit: 'kg/s', testId: 'flow-kg-per-s' },
    { label: 'Mass flow', value: mass.value, unit: mass.unit },
    {
      label: 'Normal volume',
      note: '0 °C, 101.325 kPa (DIN 1343)',
      value: figure(f.normalM3PerH),
      unit: 'Nm³/h',
      testId: 'flow-nm3-per-h',
    },
    {
      label: 'Standard volume',
      note: '15 °C, 101.325 kPa (ISO 13443)',
      value: figure(f.standardM3PerH),
      unit: 'Sm³/h',
    },
    { label: 'Standard volume', note: '60 °F, 14.696 psia', value: figure(f.scfm), unit: 'SCFM', testId: 'flow-scfm' },
    { label: 'Standard volume', note: '60 °F, 14.696 psia', value: fixed(f.mmscfd, 4), unit: 'MMSCFD' },
    {
      label: result.service === 'heater' ? 'Inlet actual flow' : 'Suction actual flow',
      value: fixed(result.inletActualFlowM3PerH, 1),
      unit: 'm³/h',
    },
    ...outlet,
    { label: 'Molar mass', value: fixed(result.molarMassKgPerKmol, 3), unit: 'kg/kmol' },
  ];
  return <FigureTable caption="Flows" rows={rows} testId="flows-table" />;
}
