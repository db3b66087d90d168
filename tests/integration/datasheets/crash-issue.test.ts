import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { blobs, datasheets } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { createPostgresBlobStore, createS3BlobStore, sweepOrphanBlobs } from '@/lib/blob';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { startS3FakeServer, type RunningS3Fake } from '@/mocks/s3/http-server';
import { makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { nitrogenHeater } from './requests';

const root = fileURLToPath(new URL('../../..', import.meta.url));
const child = fileURLToPath(new URL('./crash-child.ts', import.meta.url));
let s3: RunningS3Fake;

beforeAll(async () => {
  s3 = await startS3FakeServer({ buckets: ['dutywise-crash'], accessKeyId: 'AKCRASHTEST' });
});
afterAll(() => s3.close());

/** Starts an issue in a separate process, waits until it is about to commit, then kills it outright. */
function issueAndKill(user: CurrentUser, sizingId: string, store: 'postgres' | 's3'): Promise<string> {
  return new Promise((resolve, reject) => {
    const proc = spawn(
      process.execPath,
      [
        '--require',
        './db/script-preload.cjs',
        '--import',
        'tsx',
        child,
        JSON.stringify(user),
        sizingId,
        store,
        s3.endpoint,
      ],
      {
        cwd: root,
        env: { ...process.env },
        stdio: ['ignore', 'pipe', 'pipe'],
      },
    );
    let out = '';
    let err = '';
    proc.stderr.on('data', (d: Buffer) => (err += d.toString()));
    proc.stdout.on('data', (d: Buffer) => {
      out += d.toString();
      const m = /READY (\S+)/.exec(out);
      if (m) {
        proc.kill('SIGKILL');
        proc.once('exit', () => resolve(m[1]!));
      }
    });
    proc.once('exit', (code, signal) => {
      if (signal !== 'SIGKILL') reject(new Error(`child exited ${code} before the commit point: ${err.slice(-2000)}`));
    });
  });
}

async function setup(kind: string) {
  const account = await makeAccount(`Crash ${kind}`);
  const engineer = await makeUser('sales_engineer');
  const sizing = await makeEngineSizing(engineer, account.id, nitrogenHeater, {
    title: `Crash during issue (${kind})`,
    tag: 'EH-7601',
  });
  return { engineer, sizing };
}

describe('the app process dying in the middle of an issue', () => {
  it(
    'with the PostgreSQL store leaves no datasheet row and no blob row, and the next issue is A',
    { timeout: 90_000 },
    async () => {
      const { engineer, sizing } = await setup('pg');
      const key = await issueAndKill(engineer, sizing.id, 'postgres');
      expect(await db.select().from(blobs).where(eq(blobs.key, key))).toHaveLength(0);
      expect(await db.select().from(datasheets).where(eq(datasheets.sizingId, sizing.id))).toHaveLength(0);
      const next = await issueDatasheet(engineer, { sizingId: sizing.id }, { store: createPostgresBlobStore() });
      expect(next.revision).toBe('A');
    },
  );

  it(
    'with the S3 store leaves no rows; the uploaded object is an orphan the sweeper removes',
    { timeout: 90_000 },
    async () => {
      const { engineer, sizing } = await setup('s3');
      const key = await issueAndKill(engineer, sizing.id, 's3');
      expect(await db.select().from(datasheets).where(eq(datasheets.sizingId, sizing.id))).toHaveLength(0);
      const store = createS3BlobStore({
        bucket: 'dutywise-crash',
        region: 'us-east-1',
        endpoint: s3.endpoint,
        accessKeyId: 'AKCRASHTEST',
        secretAccessKey: 'crash-secret',
      });
      expect(await store.exists(key)).toBe(true);
      // As the sweeper finds it an hour later: older than its cut-off and referenced by no row.
      const report = await sweepOrphanBlobs({ store, olderThanMinutes: 30, now: new Date(Date.now() + 3_600_000) });
      expect(report.deleted).toEqual([key]);
      expect(await store.exists(key)).toBe(false);
      const next = await issueDatasheet(engineer, { sizingId: sizing.id }, { store });
      expect(next.revision).toBe('A');
      expect(await store.exists(next.blobKey)).toBe(true);
    },
  );
});
