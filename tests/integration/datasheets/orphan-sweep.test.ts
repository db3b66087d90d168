import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { blobs } from '@/db/schema';
import { accountKey, createPostgresBlobStore, sha256Hex, sweepOrphanBlobs } from '@/lib/blob';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { nitrogenHeater } from './requests';
import { s3Fake, s3Server, s3Store } from './s3-harness';

beforeAll(() => s3Server.listen({ onUnhandledRequest: 'bypass' }));
afterAll(() => s3Server.close());

const HOUR = 3_600_000;
const pdf = new TextEncoder().encode('%PDF-1.4 orphan');

describe('the orphan sweeper', () => {
  it('deletes old unreferenced S3 objects and keeps referenced and recent ones', async () => {
    const account = await makeAccount('Sweep S3');
    const engineer = await makeUser('sales_engineer');
    const sizing = await makeEngineSizing(engineer, account.id, nitrogenHeater, {
      title: 'Sweep check',
      tag: 'EH-7401',
    });
    const issued = await issueDatasheet(engineer, { sizingId: sizing.id }, { store: s3Store });
    // What a crash between upload and commit leaves: an object no revision row points at.
    const oldOrphan = accountKey(account.id, 'datasheets', 'DS00-0000', `A-${randomUUID()}.pdf`);
    const freshOrphan = accountKey(account.id, 'datasheets', 'DS00-0000', `B-${randomUUID()}.pdf`);
    await s3Store.put(oldOrphan, pdf, 'application/pdf');
    await s3Store.put(freshOrphan, pdf, 'application/pdf');
    const objects = s3Fake.objects('dutywise-test');
    for (const key of [oldOrphan, issued.blobKey]) objects.get(key)!.lastModified = new Date(Date.now() - 2 * HOUR);
    const report = await sweepOrphanBlobs({ store: s3Store, olderThanMinutes: 60 });
    expect(report.deleted).toEqual([oldOrphan]);
    expect(await s3Store.exists(oldOrphan)).toBe(false);
    expect(await s3Store.exists(issued.blobKey)).toBe(true);
    expect(await s3Store.exists(freshOrphan)).toBe(true);
    expect(sha256Hex((await s3Store.get(issued.blobKey))!.bytes)).toBe(issued.sha256);
  });

  it('works the same on the PostgreSQL store', async () => {
    const account = await makeAccount('Sweep PG');
    const store = createPostgresBlobStore();
    const orphan = accountKey(account.id, 'datasheets', 'DS00-0000', `A-${randomUUID()}.pdf`);
    await db.insert(blobs).values({
      key: orphan,
      accountId: account.id,
      contentType: 'application/pdf',
      byteSize: pdf.byteLength,
      sha256: sha256Hex(pdf),
      data: Buffer.from(pdf),
      createdAt: new Date(Date.now() - 3 * HOUR),
    });
    const report = await sweepOrphanBlobs({ store, olderThanMinutes: 120 });
    expect(report.deleted).toContain(orphan);
    expect(await db.select().from(blobs).where(eq(blobs.key, orphan))).toHaveLength(0);
  });

  it('refuses a cut-off short enough to catch an issue in flight', async () => {
    await expect(sweepOrphanBlobs({ store: s3Store, olderThanMinutes: 0 })).rejects.toThrow(/at least 1/);
  });
});
