// Fills a benchmark database with a realistic spread of saved sizings (default 1,000,000) and the
// datasheets and quotes that name some of them, for the look-up and load benchmarks. Never part of the demo
// seed. The rows are made inside PostgreSQL (generate_series over engine templates), a large fill drops the
// secondary indexes and builds them once at the end, and a run resumes where an earlier one stopped.
// Usage: DATABASE_URL=... npx tsx --require ./db/script-preload.cjs tests/bench/generate-sizings.ts [count]
import { pool } from '@/db';
import { insertDatasheets, insertQuotes, insertSizings } from './generate/fill-sql';
import { dropSecondaryIndexes, rebuildDroppedIndexes } from './generate/indexes';
import { makeTemplates } from './generate/templates';
import { areas, customerNames, noteSentences, purposes, tagPrefixes } from './generate/vocabulary';

const target = Number(process.argv[2] ?? 1_000_000);
const CHUNK = 250_000;
const TEMPLATES = 20_000;

async function ensureIds(): Promise<{ accounts: string[]; creators: string[] }> {
  const accounts = await pool.query<{ id: string }>(
    `insert into accounts (id, name)
     select md5('bench-account-' || n)::uuid, n from unnest($1::text[]) n
     on conflict (id) do update set name = excluded.name returning id`,
    [customerNames],
  );
  const creators = await pool.query<{ id: string }>(
    `insert into users (id, email, name, role)
     select md5('bench-user-' || i)::uuid, 'bench-engineer-' || i || '@bench.example', 'Bench engineer ' || i,
       'sales_engineer'
     from generate_series(1, 12) i
     on conflict (id) do update set name = excluded.name returning id`,
  );
  return { accounts: accounts.rows.map((r) => r.id), creators: creators.rows.map((r) => r.id) };
}

async function loadTemplates(): Promise<void> {
  await pool.query(`create table if not exists bench_templates (k int primary key, service text, gas text,
    input jsonb, result jsonb, headline_kw float8, mass_flow_kg_per_s float8)`);
  const { rows } = await pool.query<{ n: number }>('select count(*)::int as n from bench_templates');
  if (rows[0]!.n > 0) return;
  const t = makeTemplates(TEMPLATES);
  await pool.query(
    `insert into bench_templates
     select k - 1, s, g, i::jsonb, r::jsonb, kw, f
     from unnest($1::text[], $2::text[], $3::text[], $4::text[], $5::float8[], $6::float8[])
       with ordinality as u(s, g, i, r, kw, f, k)`,
    [
      t.map((x) => x.service),
      t.map((x) => x.gas),
      t.map((x) => x.input),
      t.map((x) => x.result),
      t.map((x) => x.headlineKw),
      t.map((x) => x.massFlowKgPerS),
    ],
  );
}

async function generated(): Promise<number> {
  await pool.query('create table if not exists bench_progress (rows int not null)');
  const { rows } = await pool.query<{ rows: number }>('select rows from bench_progress');
  return rows[0]?.rows ?? 0;
}

async function fill(from: number, ids: { accounts: string[]; creators: string[] }): Promise<void> {
  const started = Date.now();
  for (let first = from + 1; first <= target; first += CHUNK) {
    const last = Math.min(first + CHUNK - 1, target);
    const client = await pool.connect();
    try {
      // Generated rows are consistent by construction: skip foreign-key and trigger work row by row.
      await client.query(`begin; set local session_replication_role = replica; set local statement_timeout = 0`);
      await client.query(insertSizings, [
        first,
        last,
        ids.accounts,
        ids.creators,
        areas,
        purposes,
        noteSentences,
        tagPrefixes,
        target,
      ]);
      await client.query(insertDatasheets, [first, last]);
      await client.query(insertQuotes, [first, last, ids.creators]);
      await client.query('delete from bench_progress');
      await client.query('insert into bench_progress values ($1)', [last]);
      await client.query('commit');
    } catch (err) {
      await client.query('rollback');
      throw err;
    } finally {
      client.release();
    }
    console.log(`  ${last.toLocaleString('en-GB')} sizings, ${((Date.now() - started) / 1000).toFixed(0)} s`);
  }
}

async function main() {
  const done = await generated();
  const t0 = Date.now();
  if (done < target) {
    const ids = await ensureIds();
    await loadTemplates();
    // Building an index once is far cheaper than keeping it up to date through a large fill.
    if (target - done > done) console.log(`dropped ${await dropSecondaryIndexes(pool)} indexes for the fill`);
    await fill(done, ids);
  }
  const rebuilt = await rebuildDroppedIndexes(pool);
  if (done < target || rebuilt) {
    // The look-up's word list is kept by a trigger, which the fill skipped.
    await pool.query('select refresh_search_terms()');
    await pool.query('vacuum analyze sizings, datasheets, quotes, quote_items, accounts');
    console.log(`generated ${target.toLocaleString('en-GB')} sizings in ${((Date.now() - t0) / 1000).toFixed(0)} s`);
  } else console.log(`already ${done.toLocaleString('en-GB')} generated sizings; nothing to add`);
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
