// `npm run db:restore -- --from DIR`: brings a backup back into the empty database named by MIGRATION_DATABASE_URL (else DATABASE_URL)
// (and, for a backup of the S3 store, its documents into the store BLOB_STORE names). Refuses a damaged
// backup and a target that already holds tables, then checks every restored document against its hash.
import { Client } from 'pg';
import { copyBlobsIn } from './blob-files';
import { damagedFiles, DUMP_FILE, readManifest } from './manifest';
import { libpqEnv, pgTool, redactUrl, runTool } from './pg-tools';
import path from 'node:path';

// The schema's owner: it reads every schema (pg-boss's included) and restores objects with their grants.
const url =
  process.env.MIGRATION_DATABASE_URL ?? process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55432/dutywise_demo';
const fromArg = process.argv.indexOf('--from');
const from = fromArg > 0 ? process.argv[fromArg + 1] : undefined;

/** Relations outside the system schemas: an empty database (as createdb makes it) has none. */
async function existingRelations(): Promise<string[]> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    const { rows } = await client.query<{ name: string }>(`
      select n.nspname || '.' || c.relname as name from pg_class c join pg_namespace n on n.oid = c.relnamespace
      where c.relkind in ('r', 'p', 'v', 'm', 'S') and n.nspname not in ('pg_catalog', 'information_schema')
        and n.nspname not like 'pg\\_%' order by 1 limit 5`);
    return rows.map((r) => r.name);
  } finally {
    await client.end();
  }
}

async function main(): Promise<boolean> {
  if (!from) throw new Error('name the backup folder: npm run db:restore -- --from <folder>');
  // The restored documents are checked through the app's own connection (DATABASE_URL): it must name the same
  // database, or the check would read another one.
  const app = process.env.DATABASE_URL ? new URL(process.env.DATABASE_URL) : null;
  const target = new URL(url);
  if (app && (app.host !== target.host || app.pathname !== target.pathname))
    throw new Error(
      `DATABASE_URL names ${app.host}${app.pathname} but the restore goes into ${target.host}${target.pathname}: point both at the empty target database`,
    );
  const dir = path.resolve(from);
  const manifest = await readManifest(dir);
  const damaged = await damagedFiles(dir, manifest);
  if (damaged.length)
    throw new Error(`the backup is damaged; these files are missing or changed: ${damaged.join(', ')}`);
  const found = await existingRelations();
  if (found.length)
    throw new Error(`${redactUrl(url)} is not empty (it holds ${found.join(', ')}…); restore into a new database`);

  await runTool(
    pgTool('pg_restore'),
    [
      '--exit-on-error',
      '--single-transaction',
      '--no-owner',
      '--no-privileges',
      '--dbname',
      new URL(url).pathname.slice(1),
      path.join(dir, DUMP_FILE),
    ],
    libpqEnv(url),
  );
  const { getBlobStore } = await import('@/lib/blob');
  const copied = await copyBlobsIn(getBlobStore(), manifest.blobs, dir);
  const { verifyRestore } = await import('./verify');
  const check = await verifyRestore(manifest);
  console.log(
    `restored ${manifest.createdAt} backup into ${redactUrl(url)}: ${copied} documents copied into the ` +
      `${getBlobStore().kind} store; ${check.revisionsChecked} datasheet revisions and ${check.objectsChecked} ` +
      `other documents checked against their SHA-256`,
  );
  for (const p of check.problems) console.error(`  problem: ${p}`);
  return check.problems.length === 0;
}

main()
  .then(async (ok) => {
    await (await import('@/db')).pool.end();
    process.exit(ok ? 0 : 1);
  })
  .catch(async (err: Error) => {
    console.error(`restore failed: ${err.message}`);
    await (await import('@/db')).pool.end().catch(() => undefined);
    process.exit(1);
  });
