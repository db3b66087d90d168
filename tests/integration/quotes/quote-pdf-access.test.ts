import { and, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import '../helpers/session';
import { bindQuotePdfAction } from '@/app/(desk)/quotes/[quoteId]/actions';
import { GET } from '@/app/api/v1/quote-documents/[documentId]/route';
import { db } from '@/db';
import { auditLog } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { bindQuoteDocument } from '@/lib/quotes/document/bind';
import { getQuoteDocumentDownload } from '@/lib/quotes/document/download';
import { listQuoteEditions } from '@/lib/quotes/document/editions';
import { setQuoteStatus } from '@/lib/quotes/mutations';
import { grantSubscription } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { actAs } from '../helpers/session';
import { sentQuoteWithDatasheets } from './quote-pdf-fixture';

let f: Awaited<ReturnType<typeof sentQuoteWithDatasheets>>;
let documentId: string;
let customer: CurrentUser;
let otherCustomer: CurrentUser;

beforeAll(async () => {
  f = await sentQuoteWithDatasheets();
  customer = await makeUser('customer', f.account.id);
  const other = await makeAccount('Other customer');
  otherCustomer = await makeUser('customer', other.id);
  await grantSubscription(other.id);
  documentId = (await bindQuoteDocument(f.engineer, f.quoteId)).edition.id;
});

const call = (id: string, accept = 'application/json') =>
  GET(new Request(`http://localhost:3000/api/v1/quote-documents/${id}`, { headers: { accept } }), {
    params: Promise.resolve({ documentId: id }),
  });

describe('who may bind a quote PDF', () => {
  it('a customer cannot, in the library or through the server action', async () => {
    await expect(bindQuoteDocument(customer, f.quoteId)).rejects.toMatchObject({ code: 'forbidden' });
    await actAs(customer);
    const res = await bindQuotePdfAction({ quoteId: f.quoteId });
    expect(res).toMatchObject({ ok: false, status: 403 });
  });

  it('support, who changes no documents, cannot either', async () => {
    await expect(bindQuoteDocument(await makeUser('support'), f.quoteId)).rejects.toMatchObject({ code: 'forbidden' });
  });

  it('a draft quote is refused with the reason, and nothing is stored', async () => {
    const draft = await sentQuoteWithDatasheets({ send: false });
    await expect(bindQuoteDocument(draft.engineer, draft.quoteId)).rejects.toMatchObject({
      code: 'conflict',
      message: expect.stringMatching(/is a draft\. Send it to the customer first/),
    });
    expect(await listQuoteEditions(draft.engineer, draft.quoteId)).toEqual([]);
  });

  it('vendor staff bind through the server action and see the edition listed', async () => {
    await actAs(f.engineer);
    const res = await bindQuotePdfAction({ quoteId: f.quoteId });
    expect(res).toMatchObject({ ok: true, data: { edition: 1, created: false } });
    expect((await listQuoteEditions(f.engineer, f.quoteId)).map((e) => e.id)).toEqual([documentId]);
  });
});

describe('who may download it: the rules of datasheet downloads', () => {
  it("another account's customer gets not-found, even subscribed", async () => {
    expect(await getQuoteDocumentDownload(otherCustomer, documentId)).toEqual({ status: 'not-found' });
    await expect(listQuoteEditions(otherCustomer, f.quoteId)).rejects.toMatchObject({ code: 'not_found' });
    await actAs(otherCustomer);
    expect((await call(documentId)).status).toBe(404);
  });

  it('the customer without a subscription sees the edition but is locked: 402, or the subscription page with the reason', async () => {
    expect((await listQuoteEditions(customer, f.quoteId)).map((e) => e.id)).toEqual([documentId]);
    await actAs(customer);
    const res = await call(documentId);
    expect(res.status).toBe(402);
    expect(await res.json()).toMatchObject({
      billingUrl: '/billing',
      errors: [{ message: expect.stringMatching(/subscription/) }],
    });
    const page = await call(documentId, 'text/html,application/xhtml+xml');
    expect(page.status).toBe(303);
    expect(page.headers.get('location')).toBe('/billing?locked=quote-pdf');
  });

  it('once subscribed the customer downloads the PDF, and the download is audited', async () => {
    await grantSubscription(f.account.id);
    await actAs(customer);
    const res = await call(documentId);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const audits = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, documentId), eq(auditLog.action, 'quote.document_downloaded')));
    expect(audits.map((a) => a.actorUserId)).toContain(customer.id);
  });

  it('a quote taken back to draft hides its PDF from the customer again', async () => {
    await setQuoteStatus(f.engineer, f.quoteId, 'draft');
    expect(await getQuoteDocumentDownload(customer, documentId)).toEqual({ status: 'not-found' });
    expect((await getQuoteDocumentDownload(f.engineer, documentId)).status).toBe('ok');
  });
});
