// Run as a child process by the kill test: starts a large batch save and is killed while its
// transaction is open. Usage: kill-child.ts <accountId> <userId> <rows>
import { saveBatch } from '@/lib/batch/commit';

const [accountId, userId, rows] = process.argv.slice(2);
const cells = Array.from({ length: Number(rows) }, (_, i) => ({
  service: 'heater',
  title: `Killed batch ${i}`,
  equipment_tag: `KB-${i}`,
  gas: 'air',
  flow_value: String(100 + i),
  flow_unit: 'kg/h',
  inlet_temperature_value: '20',
  inlet_temperature_unit: 'degC',
  inlet_pressure_value: '101.325',
  inlet_pressure_unit: 'kPa',
  outlet_temperature_value: '200',
  outlet_temperature_unit: 'degC',
}));
saveBatch(
  {
    id: userId!,
    email: 'k@test.example',
    name: 'Kill test',
    role: 'sales_engineer',
    accountId: null,
    unitSystem: 'si',
  },
  { accountId: accountId!, newQuoteTitle: 'Killed midway' },
  cells.map((c, i) => ({ row: i + 2, cells: c })),
  { name: 'k.csv', type: 'text/csv', bytes: Buffer.from('service\nheater\n') },
)
  .then(() => console.log('finished'))
  .catch((err) => console.error(err));
