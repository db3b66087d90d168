// After a restore: every datasheet revision's bytes against the SHA-256 recorded when it was issued, every
// other listed object against the manifest, and the row count of every table against the snapshot.
import { sql } from 'drizzle-orm';
import { db } from '@/db';
import { getBlobStore, sha256Hex } from '@/lib/blob';
import type { BackupManifest } from './manifest';

export type RestoreCheck = { revisionsChecked: number; objectsChecked: number; problems: string[] };

/** Reads the restored database through the configured blob store and lists every difference found. */
export async function verifyRestore(manifest: BackupManifest): Promise<RestoreCheck> {
  const store = getBlobStore();
  const problems: string[] = [];
  const revisions = await db.execute<{ key: string; sha256: string; label: string }>(sql`
    select r.blob_key as key, r.sha256, d.number || ' rev ' || r.revision as label
    from datasheet_revisions r join datasheets d on d.id = r.datasheet_id order by d.number, r.revision`);
  for (const r of revisions.rows) {
    const got = await store.get(r.key);
    if (!got) problems.push(`${r.label}: its document ${r.key} is missing`);
    else if (sha256Hex(got.bytes) !== r.sha256) problems.push(`${r.label}: its document does not match its SHA-256`);
  }
  let objectsChecked = 0;
  for (const blob of manifest.blobs.filter((b) => b.kind !== 'datasheet')) {
    const got = await store.get(blob.key);
    objectsChecked += 1;
    if (!got || sha256Hex(got.bytes) !== blob.sha256) problems.push(`${blob.key}: missing or changed`);
  }
  for (const [table, expected] of Object.entries(manifest.tables)) {
    const res = await db.execute<{ n: string }>(sql`select count(*) as n from ${sql.identifier(table)}`);
    const actual = Number(res.rows[0]?.n);
    if (actual !== expected) problems.push(`table ${table}: ${actual} rows restored, ${expected} backed up`);
  }
  return { revisionsChecked: revisions.rows.length, objectsChecked, problems };
}
