import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import '../helpers/session';
import { issueDatasheetAction } from '@/app/(desk)/datasheets/actions';
import { GET } from '@/app/api/v1/datasheets/[revisionId]/route';
import { db } from '@/db';
import { auditLog } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { sha256Hex } from '@/lib/blob';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { issueDatasheet, type IssuedRevision } from '@/lib/datasheets/issue';
import { downloadAccess, listDatasheets } from '@/lib/datasheets/queries';
import { grantSubscription, makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { actAs } from '../helpers/session';
import { nitrogenHeater } from './requests';

let issued: IssuedRevision;
let sizingId: string;
let accountA: string;
let lockedCustomer: CurrentUser;
let otherCustomer: CurrentUser;
let support: CurrentUser;
let engineer: CurrentUser;

beforeAll(async () => {
  const a = await makeAccount('Download Access');
  const b = await makeAccount('Other Customer');
  accountA = a.id;
  engineer = await makeUser('sales_engineer');
  support = await makeUser('support');
  lockedCustomer = await makeUser('customer', a.id);
  otherCustomer = await makeUser('customer', b.id);
  await grantSubscription(b.id);
  sizingId = (await makeEngineSizing(engineer, a.id, nitrogenHeater, { title: 'Access check', tag: 'EH-7501' })).id;
  issued = await issueDatasheet(engineer, { sizingId });
});

const call = (id: string) =>
  GET(new Request(`http://localhost:3000/api/v1/datasheets/${id}`), { params: Promise.resolve({ revisionId: id }) });
const downloads = (revisionId: string) =>
  db
    .select()
    .from(auditLog)
    .where(and(eq(auditLog.entityId, revisionId), eq(auditLog.action, 'datasheet.downloaded')));

describe('who may download an issued revision', () => {
  it("another account's customer gets not-found, even with a subscription of their own", async () => {
    expect(await getRevisionDownload(otherCustomer, issued.revisionId)).toEqual({ status: 'not-found' });
    expect((await listDatasheets(otherCustomer)).map((d) => d.id)).not.toContain(issued.datasheetId);
    await actAs(otherCustomer);
    expect((await call(issued.revisionId)).status).toBe(404);
  });

  it('a customer without a subscription sees the datasheet listed but gets locked (402 over HTTP)', async () => {
    expect((await listDatasheets(lockedCustomer)).map((d) => d.id)).toEqual([issued.datasheetId]);
    expect(await downloadAccess(lockedCustomer)).toEqual({ unlocked: false, reason: 'no-subscription' });
    expect(await getRevisionDownload(lockedCustomer, issued.revisionId)).toMatchObject({ status: 'locked' });
    await actAs(lockedCustomer);
    const res = await call(issued.revisionId);
    expect(res.status).toBe(402);
    const body = (await res.json()) as { errors: { message: string }[]; billingUrl: string };
    expect(body.errors[0]?.message).toMatch(/active subscription/);
    expect(body.billingUrl).toBe('/billing');
    expect((await downloads(issued.revisionId)).filter((d) => d.actorUserId === lockedCustomer.id)).toHaveLength(0);
  });

  it('staff download any account and every download is audited', async () => {
    const before = (await downloads(issued.revisionId)).length;
    const out = await getRevisionDownload(support, issued.revisionId);
    expect(out.status).toBe('ok');
    const rows = await downloads(issued.revisionId);
    expect(rows).toHaveLength(before + 1);
    expect(rows.at(-1)).toMatchObject({ actorUserId: support.id, actorRole: 'support', accountId: accountA });
  });

  it('serves the PDF with its name, hash and no caching once the account subscribes', async () => {
    const customer = await makeUser('customer', accountA);
    await actAs(customer);
    expect((await call(issued.revisionId)).status).toBe(402);
    await grantSubscription(accountA);
    const res = await call(issued.revisionId);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-disposition')).toBe(
      `attachment; filename="${issued.number}-rev${issued.revision}.pdf"`,
    );
    expect(res.headers.get('cache-control')).toBe('private, no-store');
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect(res.headers.get('x-content-sha256')).toBe(sha256Hex(bytes));
    expect(sha256Hex(bytes)).toBe(issued.sha256);
    expect((await downloads(issued.revisionId)).some((d) => d.actorUserId === customer.id)).toBe(true);
  });

  it('answers 401 signed out and 404 for ids that are malformed or unknown', async () => {
    await actAs(null);
    expect((await call(issued.revisionId)).status).toBe(401);
    await actAs(support);
    expect((await call('not-a-uuid')).status).toBe(404);
    expect((await call(randomUUID())).status).toBe(404);
  });
});

describe('issuing through the server action', () => {
  it('validates the input and names the field', async () => {
    await actAs(engineer);
    const bad = await issueDatasheetAction({ sizingId: 'nope' });
    expect(bad).toMatchObject({ ok: false, status: 400 });
    expect(!bad.ok && bad.errors.some((e) => e.path === 'sizingId')).toBe(true);
    const long = await issueDatasheetAction({ sizingId, note: 'x'.repeat(501) });
    expect(!long.ok && long.errors.find((e) => e.path === 'note')?.message).toMatch(/500 characters/);
  });

  it('refuses roles without the permission and other accounts, and issues the next letter otherwise', async () => {
    await actAs(support);
    expect(await issueDatasheetAction({ sizingId })).toMatchObject({ ok: false, status: 403 });
    // A customer never issues, not even on its own account: the datasheet is the vendor's document.
    await actAs(otherCustomer);
    expect(await issueDatasheetAction({ sizingId })).toMatchObject({ ok: false, status: 403 });
    await actAs(engineer);
    const res = await issueDatasheetAction({ sizingId, note: 'Checked against the site survey' });
    expect(res).toMatchObject({ ok: true, data: { number: issued.number } });
    expect(res.ok && res.data.revision).not.toBe('A');
  });
});
