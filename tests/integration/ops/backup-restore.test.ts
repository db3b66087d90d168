import { createHash } from 'node:crypto';
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createS3BlobStore } from '@/lib/blob';
import { startS3FakeServer, type RunningS3Fake } from '@/mocks/s3/http-server';
import { cloneDatabase, createDatabase, dropDatabase, runScript, type ScriptEnv } from './backup-rig';

// `npm run db:backup` on the seeded demo, `npm run db:restore` into a new, empty database, then every
// datasheet revision's bytes read back from the restored store against the SHA-256 stored when it was issued.
const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');
const scratch = mkdtempSync(path.join(os.tmpdir(), 'dutywise-backup-'));
const created: string[] = [];

async function query<T>(url: string, text: string): Promise<T[]> {
  const c = new Client({ connectionString: url });
  await c.connect();
  try {
    return (await c.query(text)).rows as T[];
  } finally {
    await c.end();
  }
}

async function fresh(name: string): Promise<string> {
  created.push(name);
  return createDatabase(name);
}

const tableCounts = async (url: string) => {
  const tables = await query<{ t: string }>(url, `select tablename as t from pg_tables where schemaname = 'public'`);
  const out: Record<string, number> = {};
  for (const { t } of tables) out[t] = Number((await query<{ n: string }>(url, `select count(*) n from "${t}"`))[0]!.n);
  return out;
};

type Revision = { id: string; sha256: string; key: string };
const revisionsOf = (url: string) =>
  query<Revision>(url, 'select id, sha256, blob_key as key from datasheet_revisions order by id');

const tag = `${process.pid}_${Date.now() % 100000}`;
let seeded = '';

// Seeded once: the demo scenario with its issued datasheets, in the PostgreSQL store.
beforeAll(async () => {
  // Named *_test: the demo seed refuses any other database (its users share a published password).
  seeded = await fresh(`dutywise_bk_src_${tag}_test`);
  await runScript(['db:migrate'], { DATABASE_URL: seeded });
  await runScript(['db:seed'], { DATABASE_URL: seeded });
}, 300_000);

afterAll(async () => {
  for (const name of created) await dropDatabase(name);
  rmSync(scratch, { recursive: true, force: true });
});

describe('backups of the PostgreSQL blob store', () => {
  let dir = '';

  beforeAll(async () => {
    dir = path.join(scratch, 'pg');
    await runScript(['db:backup', '--', '--out', dir], { DATABASE_URL: seeded });
  }, 120_000);

  it('restores the seeded demo into a fresh database with every datasheet byte intact', async () => {
    const target = await fresh(`dutywise_bk_dst_${tag}`);
    const out = await runScript(['db:restore', '--', '--from', dir], { DATABASE_URL: target });
    expect(out).toMatch(/datasheet revisions .* checked against their SHA-256/);

    const restored = await query<{ id: string; sha256: string; data: Buffer }>(
      target,
      'select r.id, r.sha256, b.data from datasheet_revisions r join blobs b on b.key = r.blob_key order by r.id',
    );
    const original = await revisionsOf(seeded);
    expect(original.length).toBeGreaterThanOrEqual(3);
    expect(restored.map((r) => [r.id, r.sha256])).toEqual(original.map((r) => [r.id, r.sha256]));
    for (const r of restored) expect(sha256(r.data), r.id).toBe(r.sha256);
    expect(await tableCounts(target)).toEqual(await tableCounts(seeded));
    // The restored database keeps its rules: an issued revision still cannot be changed.
    await expect(query(target, `update datasheet_revisions set note = 'x'`)).rejects.toThrow();
  }, 120_000);

  it('refuses a database that is not empty, and a backup whose files changed', async () => {
    await expect(runScript(['db:restore', '--', '--from', dir], { DATABASE_URL: seeded })).rejects.toThrow(
      /is not empty/,
    );

    const damaged = path.join(scratch, 'damaged');
    cpSync(dir, damaged, { recursive: true });
    const dump = path.join(damaged, 'database.dump');
    const bytes = readFileSync(dump);
    bytes.writeUInt8(bytes.readUInt8(bytes.length - 10) ^ 0xff, bytes.length - 10);
    writeFileSync(dump, bytes);
    const target = await fresh(`dutywise_bk_bad_${tag}`);
    await expect(runScript(['db:restore', '--', '--from', damaged], { DATABASE_URL: target })).rejects.toThrow(
      /damaged.*database\.dump/,
    );
    expect(await tableCounts(target)).toEqual({});
  }, 120_000);
});

describe('backups of the S3 blob store', () => {
  let sourceBucket: RunningS3Fake;
  let targetBucket: RunningS3Fake;
  const bucket = 'dutywise-backup';
  const keys = { accessKeyId: 'AKBACKUPTEST', secretAccessKey: 'backup-test-secret' };
  const s3Env = (fake: RunningS3Fake): ScriptEnv => ({
    BLOB_STORE: 's3',
    S3_ENDPOINT: fake.endpoint,
    S3_BUCKET: bucket,
    S3_ACCESS_KEY_ID: keys.accessKeyId,
    S3_SECRET_ACCESS_KEY: keys.secretAccessKey,
  });

  beforeAll(async () => {
    sourceBucket = await startS3FakeServer({ buckets: [bucket], accessKeyId: 'AKBACKUPTEST' });
    targetBucket = await startS3FakeServer({ buckets: [bucket], accessKeyId: 'AKBACKUPTEST' });
  });
  afterAll(async () => {
    await sourceBucket?.close();
    await targetBucket?.close();
  });

  it('copies the referenced objects out and into an empty bucket, bytes matching their SHA-256', async () => {
    // The seeded demo as a deployment on S3 keeps it: its documents in the bucket, none in the blobs table.
    created.push(`dutywise_bk_s3src_${tag}`);
    const source = await cloneDatabase(seeded, `dutywise_bk_s3src_${tag}`);
    const stored = await query<{ key: string; content_type: string; data: Buffer }>(
      source,
      'select key, content_type, data from blobs',
    );
    const store = createS3BlobStore({ bucket, region: 'us-east-1', endpoint: sourceBucket.endpoint, ...keys });
    for (const b of stored) await store.put(b.key, b.data, b.content_type);
    await query(source, 'delete from blobs');
    const dir = path.join(scratch, 's3');
    await runScript(['db:backup', '--', '--out', dir], { DATABASE_URL: source, ...s3Env(sourceBucket) });

    const target = await fresh(`dutywise_bk_s3dst_${tag}`);
    expect(targetBucket.fake.objects(bucket).size).toBe(0);
    await runScript(['db:restore', '--', '--from', dir], { DATABASE_URL: target, ...s3Env(targetBucket) });

    const revisions = await revisionsOf(target);
    expect(revisions.length).toBeGreaterThanOrEqual(3);
    const copied = targetBucket.fake.objects(bucket);
    for (const r of revisions) {
      const object = copied.get(r.key);
      expect(object, r.key).toBeDefined();
      expect(sha256(object!.bytes), r.key).toBe(r.sha256);
    }
    // The database dump carries no document bytes with this store: they travel as files beside it.
    expect(await query(target, 'select key from blobs')).toEqual([]);
  }, 300_000);
});
