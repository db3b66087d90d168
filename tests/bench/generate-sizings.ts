// Fills a benchmark database with a realistic spread of saved sizings (default 1,000,000), for the
// search and batch benchmarks. Never part of the demo seed. Usage:
//   DATABASE_URL=... npx tsx --require ./db/script-preload.cjs tests/bench/generate-sizings.ts [count]
import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { db, pool } from '@/db';
import { accounts, users } from '@/db/schema';
import { calculate } from '@/lib/engine';

const target = Number(process.argv[2] ?? 1_000_000);
const BATCH = 10_000;
const gases = ['air', 'nitrogen', 'methane', 'carbon-dioxide', 'hydrogen', 'argon', 'natural-gas', 'oxygen'];
const words = [
  'dryer',
  'purge',
  'regeneration',
  'preheater',
  'booster',
  'recycle',
  'instrument',
  'backfill',
  'kiln',
  'reformer',
  'superheater',
  'vent',
  'flare',
  'sweep',
];
const prefixes = ['EH', 'E', 'H', 'K', 'C', 'KM'];

// Deterministic pseudo-random so two runs make the same database.
let seed = 20261201;
const rnd = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)]!;

function duty(i: number) {
  const service = rnd() < 0.6 ? 'heater' : 'compressor';
  const gas = pick(gases);
  const flow = Math.round(50 + rnd() * 20_000);
  const input =
    service === 'heater'
      ? {
          service,
          gas: { preset: gas },
          flow: { value: flow, unit: 'kg/h' },
          inlet: {
            temperature: { value: Math.round(rnd() * 40), unit: 'degC' },
            pressure: { value: 100 + Math.round(rnd() * 900), unit: 'kPa' },
          },
          outletTemperature: { value: 60 + Math.round(rnd() * 500), unit: 'degC' },
          heatLossPercent: 5,
          designMarginPercent: 10,
        }
      : {
          service,
          gas: { preset: gas },
          flow: { value: flow, unit: 'Nm3/h' },
          inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 1, unit: 'bar' } },
          dischargePressure: { value: 2 + Math.round(rnd() * 40), unit: 'bar' },
          isentropicEfficiency: 0.75 + rnd() * 0.1,
          stages: 1 + Math.floor(rnd() * 4),
        };
  const tag = `${pick(prefixes)}-${100 + (i % 9000)}${String.fromCharCode(65 + (i % 26))}`;
  return { service, gas, input, tag, title: `${pick(words)} ${service} ${i % 500}` };
}

async function main() {
  const [{ n } = { n: 0 }] = (await db.execute<{ n: number }>(sql`select count(*)::int as n from sizings`)).rows;
  if (n >= target) return console.log(`already ${n} sizings; nothing to add`);
  const acctIds: string[] = [];
  for (let a = 0; a < 400; a++) {
    const [row] = await db
      .insert(accounts)
      .values({ name: `Bench customer ${a} ${pick(['Chemicals', 'Energy', 'Foods', 'Glass', 'Metals', 'Pharma'])}` })
      .returning({ id: accounts.id });
    acctIds.push(row!.id);
  }
  const [creator] = await db
    .insert(users)
    .values({ email: `bench-${randomUUID()}@bench.example`, name: 'Bench engineer', role: 'sales_engineer' })
    .returning({ id: users.id });
  const started = Date.now();
  for (let done = n; done < target; done += BATCH) {
    const cols: Record<string, unknown[]> = {
      number: [],
      account: [],
      title: [],
      tag: [],
      service: [],
      gasKey: [],
      input: [],
      result: [],
      kw: [],
      flow: [],
      created: [],
    };
    for (let i = done; i < Math.min(done + BATCH, target); i++) {
      const d = duty(i);
      let res;
      try {
        res = calculate(d.input);
      } catch {
        continue;
      }
      const kw = res.service === 'heater' ? res.heater.designDutyKw : res.compressor.shaftPowerKw;
      cols.number!.push(`B${String(i).padStart(8, '0')}`);
      cols.account!.push(pick(acctIds));
      cols.title!.push(d.title);
      cols.tag!.push(d.tag);
      cols.service!.push(d.service);
      cols.gasKey!.push(d.gas);
      cols.input!.push(JSON.stringify(d.input));
      // A compact result keeps a million rows to a few GB; the benchmark searches the scalar columns.
      cols.result!.push(
        JSON.stringify({
          service: res.service,
          massFlowKgPerS: res.massFlowKgPerS,
          headlineKw: kw,
          generatedForBenchmark: true,
        }),
      );
      cols.kw!.push(kw);
      cols.flow!.push(res.massFlowKgPerS);
      cols.created!.push(new Date(Date.now() - rnd() * 5 * 365 * 86_400_000).toISOString());
    }
    // pg sends each JavaScript array as one PostgreSQL array parameter; unnest turns them back into rows.
    await pool.query(
      `insert into sizings (number, account_id, title, equipment_tag, service, gas_key, gas_label, input, result, engine_version, headline_kw, mass_flow_kg_per_s, created_by_user_id, created_at)
       select u.number, u.account, u.title, u.tag, u.service::service, u.gas, u.gas, u.input::jsonb, u.result::jsonb, 'bench', u.kw, u.flow, $12, u.created::timestamptz
       from unnest($1::text[], $2::uuid[], $3::text[], $4::text[], $5::text[], $6::text[], $7::text[], $8::text[], $9::float8[], $10::float8[], $11::text[])
         as u(number, account, title, tag, service, gas, input, result, kw, flow, created)`,
      [
        cols.number,
        cols.account,
        cols.title,
        cols.tag,
        cols.service,
        cols.gasKey,
        cols.input,
        cols.result,
        cols.kw,
        cols.flow,
        cols.created,
        creator!.id,
      ],
    );
    if ((done / BATCH) % 10 === 0) console.log(`${done + BATCH} rows, ${((Date.now() - started) / 1000).toFixed(0)} s`);
  }
  await db.execute(sql`analyze sizings`);
  console.log(`generated up to ${target} sizings in ${((Date.now() - started) / 1000).toFixed(0)} s`);
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
