import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { quoteDocuments } from '@/db/schema';
import { accountKey, sha256Hex, sweepOrphanBlobs } from '@/lib/blob';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { bindQuoteDocument } from '@/lib/quotes/document/bind';
import { s3Fake, s3Server, s3Store } from '../datasheets/s3-harness';
import { sentQuoteWithDatasheets } from './quote-pdf-fixture';

beforeAll(() => s3Server.listen({ onUnhandledRequest: 'bypass' }));
afterAll(() => s3Server.close());

const HOUR = 3_600_000;

describe('a quote PDF on an S3 store', () => {
  it('is uploaded, recorded once, left alone by the orphan sweep, and leaves nothing behind when it fails', async () => {
    const f = await sentQuoteWithDatasheets({ store: s3Store });
    const { edition } = await bindQuoteDocument(f.engineer, f.quoteId, { store: s3Store });
    const [row] = await db.select().from(quoteDocuments).where(eq(quoteDocuments.id, edition.id));
    expect(sha256Hex((await s3Store.get(row!.blobKey))!.bytes)).toBe(row!.sha256);

    // A new revision changes the content; a failure inside the transaction then leaves no row and no object.
    await issueDatasheet(f.engineer, { sizingId: f.compressor.id }, { store: s3Store });
    const before = [...s3Fake.objects('dutywise-test').keys()];
    await expect(
      bindQuoteDocument(f.engineer, f.quoteId, {
        store: s3Store,
        beforeCommit: async () => {
          throw new Error('injected failure before commit');
        },
      }),
    ).rejects.toThrow('injected failure before commit');
    expect([...s3Fake.objects('dutywise-test').keys()].sort()).toEqual(before.sort());
    expect(await db.select().from(quoteDocuments).where(eq(quoteDocuments.quoteId, f.quoteId))).toHaveLength(1);

    // Old enough to be swept, but referenced by its edition: kept; an unreferenced neighbour is swept.
    const orphan = accountKey(f.account.id, 'quotes', 'Q00-0000', `E1-${randomUUID()}.pdf`);
    await s3Store.put(orphan, new TextEncoder().encode('%PDF-1.4 orphan'), 'application/pdf');
    const objects = s3Fake.objects('dutywise-test');
    for (const key of [orphan, row!.blobKey]) objects.get(key)!.lastModified = new Date(Date.now() - 2 * HOUR);
    const report = await sweepOrphanBlobs({ store: s3Store, olderThanMinutes: 60 });
    expect(report.deleted).toContain(orphan);
    expect(report.deleted).not.toContain(row!.blobKey);
    expect(await s3Store.exists(row!.blobKey)).toBe(true);
  });
});
