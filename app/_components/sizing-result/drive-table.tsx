import type { CompressorBlock } from '@/lib/engine';
import { FigureTable, type FigureRow } from './figure-table';
import { fixed, formatA, formatHp, formatKw } from './quantity-format';

/** From gas power to the motor: mechanical losses, shaft power, standard ratings and the supply. */
export function DriveTable({ c }: { c: CompressorBlock }) {
  const m = c.motor;
  const rows: FigureRow[] = [
    { label: 'Gas power', value: formatKw(c.gasPowerKw), unit: 'kW' },
    {
      label: 'Mechanical losses',
      value: formatKw(c.shaftPowerKw - c.gasPowerKw),
      unit: 'kW',
      note: `efficiency ${c.mechanicalEfficiency}: bearings, seals, gear`,
    },
    {
      label: 'Shaft power',
      value: formatKw(c.shaftPowerKw),
      unit: 'kW',
      note: `${formatHp(c.shaftPowerKw)} hp`,
      strong: true,
    },
    {
      label: 'IEC motor (IEC 60072-1 series)',
      value: m.iecKw === null ? 'above series' : `${m.iecKw} kW`,
      note: m.marginPercent === null ? undefined : `${fixed(m.marginPercent, 1)} % over shaft`,
    },
    {
      label: 'NEMA motor (MG 1 series)',
      value: m.nemaHp === null ? 'above series' : `${m.nemaHp} hp`,
      note: m.nemaMarginPercent === null ? undefined : `${fixed(m.nemaMarginPercent, 1)} % over shaft`,
    },
  ];
  if (c.drive) {
    rows.push(
      {
        label: 'Motor input',
        value: formatKw(c.drive.inputPowerKw),
        unit: 'kW',
        note: `efficiency ${c.drive.motorEfficiency}, power factor ${c.drive.powerFactor} assumed`,
      },
      {
        label: `Line current at ${fixed(c.drive.voltageV, 0)} V`,
        value: formatA(c.drive.lineCurrentA),
        unit: 'A',
        testId: 'result-motor-current-a',
      },
    );
  }
  return <FigureTable caption="Driver" rows={rows} testId="drive-table" />;
}
