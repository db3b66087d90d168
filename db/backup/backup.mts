// `npm run db:backup [-- --out DIR]`: a consistent copy of the database and of every stored document.
// pg_dump runs on a snapshot exported by this process; the blobs, row counts and migration level are read
// inside that same snapshot, so the folder describes one instant. The folder is written as DIR.partial and
// renamed when the manifest is complete: a folder without ".partial" is a whole backup.
import { mkdir, rename, stat } from 'node:fs/promises';
import path from 'node:path';
import { Client } from 'pg';
import { copyBlobsOut } from './blob-files';
import { DUMP_FILE, MANIFEST_FORMAT, sha256File, writeManifest, type BackupManifest } from './manifest';
import { libpqEnv, pgTool, redactUrl, runTool, toolVersion } from './pg-tools';
import { migrationLevel, openSnapshot, referencedBlobs, serverVersion, tableCounts } from './snapshot';

// The schema's owner: it reads every schema (pg-boss's included) and restores objects with their grants.
const url =
  process.env.MIGRATION_DATABASE_URL ?? process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55432/dutywise_demo';
const storeKind = process.env.BLOB_STORE === 's3' ? 's3' : 'postgres';
const outArg = process.argv.indexOf('--out');
const dbName = new URL(url).pathname.slice(1);
const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const dir = path.resolve(outArg > 0 ? process.argv[outArg + 1]! : path.join('.data', 'backups', `${dbName}-${stamp}`));
const work = `${dir}.partial`;

async function main() {
  if (await stat(dir).catch(() => null)) throw new Error(`${dir} already exists; choose another --out`);
  await mkdir(work, { recursive: true });
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    const snapshot = await openSnapshot(client);
    const pgDump = pgTool('pg_dump');
    await runTool(
      pgDump,
      ['--format=custom', `--snapshot=${snapshot}`, '--file', path.join(work, DUMP_FILE)],
      libpqEnv(url),
    );
    const listed = await referencedBlobs(client, storeKind);
    const { getBlobStore } = await import('@/lib/blob');
    const blobs = storeKind === 's3' ? await copyBlobsOut(getBlobStore(), listed, work) : listed;
    const manifest: BackupManifest = {
      format: MANIFEST_FORMAT,
      createdAt: new Date().toISOString(),
      source: { database: redactUrl(url), serverVersion: await serverVersion(client), dumpTool: toolVersion(pgDump) },
      migrations: await migrationLevel(client),
      blobStore: storeKind,
      files: [
        {
          path: DUMP_FILE,
          byteSize: (await stat(path.join(work, DUMP_FILE))).size,
          sha256: await sha256File(path.join(work, DUMP_FILE)),
        },
      ],
      blobs,
      tables: await tableCounts(client),
    };
    await client.query('commit');
    await writeManifest(work, manifest);
    await rename(work, dir);
    const rows = Object.values(manifest.tables).reduce((a, b) => a + b, 0);
    console.log(
      `backup written to ${dir}: ${rows} rows in ${Object.keys(manifest.tables).length} tables, ` +
        `${blobs.length} stored documents (${storeKind} store), dump ${manifest.files[0]!.byteSize} bytes`,
    );
  } finally {
    await client.end();
  }
}

main()
  .then(async () => (await import('@/db')).pool.end())
  .catch(async (err: Error) => {
    console.error(`backup failed: ${err.message}`);
    await (await import('@/db')).pool.end().catch(() => undefined);
    process.exit(1);
  });
