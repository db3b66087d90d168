// A 1,000-row enquiry: parse, validate, size and save with its quote and upload; target under 5 s.
import Papa from 'papaparse';
import { randomUUID } from 'node:crypto';
import { db, pool } from '@/db';
import { accounts, users } from '@/db/schema';
import { batchColumnNames } from '@/lib/batch/columns';
import { saveBatch } from '@/lib/batch/commit';
import { parseBatchCsv } from '@/lib/batch/parse';
import { recordResults, verdict } from './stats';

function sheet(n: number): string {
  const rows = Array.from({ length: n }, (_, i) => {
    const heater = i % 2 === 0;
    const r: Record<string, string> = heater
      ? {
          service: 'heater',
          title: `Heater ${i}`,
          equipment_tag: `EH-${i}`,
          gas: 'air',
          flow_value: String(200 + i),
          flow_unit: 'kg/h',
          inlet_temperature_value: '20',
          inlet_temperature_unit: 'degC',
          inlet_pressure_value: '2',
          inlet_pressure_unit: 'barg',
          outlet_temperature_value: '250',
          outlet_temperature_unit: 'degC',
          heat_loss_percent: '5',
          design_margin_percent: '10',
        }
      : {
          service: 'compressor',
          title: `Compressor ${i}`,
          equipment_tag: `K-${i}`,
          gas: 'CH4:0.9;C2H6:0.05;N2:0.05',
          flow_value: String(500 + i),
          flow_unit: 'Nm3/h',
          inlet_temperature_value: '25',
          inlet_temperature_unit: 'degC',
          inlet_pressure_value: '1',
          inlet_pressure_unit: 'bar',
          discharge_pressure_value: '20',
          discharge_pressure_unit: 'bar',
          stages: '3',
          isentropic_efficiency: '0.78',
        };
    return batchColumnNames.map((c) => r[c] ?? '');
  });
  return Papa.unparse({ fields: batchColumnNames, data: rows });
}

async function main() {
  const [acct] = await db
    .insert(accounts)
    .values({ name: `Batch bench ${randomUUID().slice(0, 6)}` })
    .returning({ id: accounts.id });
  const [u] = await db
    .insert(users)
    .values({ email: `batch-${randomUUID()}@bench.example`, name: 'Batch bench', role: 'sales_engineer' })
    .returning({ id: users.id });
  const user = {
    id: u!.id,
    email: 'b@bench.example',
    name: 'Batch bench',
    role: 'sales_engineer' as const,
    accountId: null,
    unitSystem: 'si' as const,
  };
  const text = sheet(1000);
  const samples: number[] = [];
  for (let run = 0; run < 3; run++) {
    const t0 = performance.now();
    const parsed = parseBatchCsv(text);
    const res = await saveBatch(user, { accountId: acct!.id, newQuoteTitle: `Bench enquiry ${run}` }, parsed.rows, {
      name: 'bench.csv',
      type: 'text/csv',
      bytes: Buffer.from(text),
    });
    samples.push(performance.now() - t0);
    if (res.saved !== 1000) throw new Error(`saved ${res.saved} of 1000`);
  }
  const worst = Math.max(...samples);
  recordResults('Batch upload', [
    [
      '1,000-row sheet parsed, sized and saved (worst of 3)',
      `${(worst / 1000).toFixed(2)} s`,
      '< 5 s',
      verdict(worst < 5000),
    ],
  ]);
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
