import { and, eq, like } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { db } from '@/db';
import { auditLog, blobs, datasheetRevisions, datasheets, outbox } from '@/db/schema';
import { createPostgresBlobStore, sha256Hex, type BlobStore } from '@/lib/blob';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { nitrogenHeater } from './requests';
import { s3Fake, s3KeysOf, s3Server, s3Store } from './s3-harness';

// Fault injection: the mail enqueue is the last write before commit, after the blob is stored.
const faults = vi.hoisted(() => ({ failMail: false }));
vi.mock('@/lib/email/enqueue', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/lib/email/enqueue')>();
  return {
    ...real,
    enqueueEmail: vi.fn(async (...args: Parameters<typeof real.enqueueEmail>) => {
      if (faults.failMail) throw new Error('injected: outbox unavailable');
      return real.enqueueEmail(...args);
    }),
  };
});

beforeAll(() => s3Server.listen({ onUnhandledRequest: 'bypass' }));
afterEach(() => {
  faults.failMail = false;
  s3Fake.setDown(false);
});
afterAll(() => s3Server.close());

async function setup() {
  const account = await makeAccount('Atomic Issue');
  const engineer = await makeUser('sales_engineer');
  const sizing = await makeEngineSizing(engineer, account.id, nitrogenHeater, {
    title: 'All or nothing',
    tag: 'EH-7301',
  });
  return { account, engineer, sizing };
}

async function nothingLeft(accountId: string, sizingId: string) {
  const ds = await db.select({ id: datasheets.id }).from(datasheets).where(eq(datasheets.sizingId, sizingId));
  const blobRows = await db
    .select({ key: blobs.key })
    .from(blobs)
    .where(like(blobs.key, `accounts/${accountId}/%`));
  const audits = await db
    .select({ id: auditLog.id })
    .from(auditLog)
    .where(and(eq(auditLog.accountId, accountId), eq(auditLog.action, 'datasheet.issued')));
  const mail = await db
    .select({ id: outbox.id })
    .from(outbox)
    .where(and(eq(outbox.accountId, accountId), eq(outbox.template, 'datasheet-issued')));
  return {
    datasheets: ds.length,
    blobRows: blobRows.length,
    audits: audits.length,
    mail: mail.length,
    s3Objects: s3KeysOf(accountId).length,
  };
}

const none = { datasheets: 0, blobRows: 0, audits: 0, mail: 0, s3Objects: 0 };
const stores: [string, BlobStore][] = [
  ['postgres', createPostgresBlobStore()],
  ['s3', s3Store],
];

describe.each(stores)('issuing with the %s store is all or nothing', (kind, store) => {
  it('stores the bytes under the account namespace and serves them back unchanged', async () => {
    const { account, engineer, sizing } = await setup();
    const issued = await issueDatasheet(engineer, { sizingId: sizing.id }, { store });
    expect(issued.blobKey.startsWith(`accounts/${account.id}/datasheets/`)).toBe(true);
    expect(await store.exists(issued.blobKey)).toBe(true);
    const dl = await getRevisionDownload(engineer, issued.revisionId, { store });
    expect(dl.status === 'ok' && sha256Hex(dl.bytes)).toBe(issued.sha256);
    expect(await nothingLeft(account.id, sizing.id)).toMatchObject({
      datasheets: 1,
      audits: 1,
      mail: 1,
      blobRows: kind === 'postgres' ? 1 : 0,
      s3Objects: kind === 's3' ? 1 : 0,
    });
  });

  it('a failure after the blob write and before commit leaves no row and no blob', async () => {
    const { account, engineer, sizing } = await setup();
    faults.failMail = true;
    await expect(issueDatasheet(engineer, { sizingId: sizing.id }, { store })).rejects.toThrow(
      /injected: outbox unavailable/,
    );
    expect(await nothingLeft(account.id, sizing.id)).toEqual(none);
    if (kind === 's3')
      expect(s3Fake.calls.filter((c) => c.key.startsWith(`accounts/${account.id}/`)).map((c) => c.op)).toEqual([
        'PutObject',
        'DeleteObject',
      ]);
  });

  it('a failure on a later revision keeps the earlier one intact and adds nothing', async () => {
    const { account, engineer, sizing } = await setup();
    const a = await issueDatasheet(engineer, { sizingId: sizing.id }, { store });
    await expect(
      issueDatasheet(
        engineer,
        { sizingId: sizing.id },
        {
          store,
          beforeCommit: async () => {
            throw new Error('injected: crash before commit');
          },
        },
      ),
    ).rejects.toThrow(/crash before commit/);
    const revs = await db
      .select({ revision: datasheetRevisions.revision })
      .from(datasheetRevisions)
      .where(eq(datasheetRevisions.datasheetId, a.datasheetId));
    expect(revs.map((r) => r.revision)).toEqual(['A']);
    expect(await nothingLeft(account.id, sizing.id)).toMatchObject({
      datasheets: 1,
      audits: 1,
      mail: 1,
      blobRows: kind === 'postgres' ? 1 : 0,
      s3Objects: kind === 's3' ? 1 : 0,
    });
    expect(await store.exists(a.blobKey)).toBe(true);
  });
});

describe('the S3 store being down', () => {
  it('fails the issue before any row is written', async () => {
    const { account, engineer, sizing } = await setup();
    s3Fake.setDown(true);
    await expect(issueDatasheet(engineer, { sizingId: sizing.id }, { store: s3Store })).rejects.toThrow();
    s3Fake.setDown(false);
    expect(await nothingLeft(account.id, sizing.id)).toEqual(none);
  });
});
