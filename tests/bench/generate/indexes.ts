// Bulk fills load faster without the secondary indexes: drop them first, fill, then build each once.
// The definitions are kept in a table before anything is dropped, so an interrupted fill rebuilds them
// on the next run instead of leaving the look-up without its indexes.
import type { Pool } from 'pg';

const TABLES = ['sizings', 'datasheets', 'quotes', 'quote_items'];

export async function dropSecondaryIndexes(pool: Pool): Promise<number> {
  await pool.query('create table if not exists bench_dropped_indexes (name text primary key, def text not null)');
  const { rows } = await pool.query<{ name: string; def: string }>(
    `select i.indexrelid::regclass::text as name, pg_get_indexdef(i.indexrelid) as def
     from pg_index i
     where i.indrelid = any($1::regclass[]) and not i.indisprimary
       and not exists (select 1 from pg_constraint c where c.conindid = i.indexrelid)`,
    [TABLES],
  );
  for (const r of rows) {
    await pool.query('insert into bench_dropped_indexes values ($1, $2) on conflict do nothing', [r.name, r.def]);
    await pool.query(`drop index if exists ${r.name}`);
  }
  return rows.length;
}

/** Builds every index a fill dropped, using both cores and generous sort memory. */
export async function rebuildDroppedIndexes(pool: Pool): Promise<number> {
  const client = await pool.connect();
  try {
    await client.query(
      `set maintenance_work_mem = '1GB'; set max_parallel_maintenance_workers = 2; set statement_timeout = 0`,
    );
    await client.query('create table if not exists bench_dropped_indexes (name text primary key, def text not null)');
    const { rows } = await client.query<{ name: string; def: string }>('select name, def from bench_dropped_indexes');
    for (const r of rows) {
      const t0 = Date.now();
      await client.query(r.def.replace(/^CREATE (UNIQUE )?INDEX /, 'CREATE $1INDEX IF NOT EXISTS '));
      await client.query('delete from bench_dropped_indexes where name = $1', [r.name]);
      console.log(`  index ${r.name}: ${((Date.now() - t0) / 1000).toFixed(0)} s`);
    }
    return rows.length;
  } finally {
    client.release();
  }
}
