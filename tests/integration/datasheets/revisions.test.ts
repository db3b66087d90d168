import { eq, sql } from 'drizzle-orm';
import { Client } from 'pg';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { auditLog, datasheetRevisions, outbox } from '@/db/schema';
import { createPostgresBlobStore, sha256Hex } from '@/lib/blob';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { listDatasheets } from '@/lib/datasheets/queries';
import { nextRevisionLetter, revisionIndexOf, revisionLetterAt } from '@/lib/datasheets/revision-letter';
import { makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { nitrogenHeater } from './requests';

const store = createPostgresBlobStore();

async function heaterSizing() {
  const account = await makeAccount('Revision Works');
  const engineer = await makeUser('sales_engineer');
  const sizing = await makeEngineSizing(engineer, account.id, nitrogenHeater, {
    title: 'Revision check',
    tag: 'EH-7201',
  });
  return { account, engineer, sizing };
}

describe('datasheet revisions', () => {
  it('a second issue is revision B and leaves A byte-for-byte as issued', async () => {
    const { account, engineer, sizing } = await heaterSizing();
    const a = await issueDatasheet(engineer, { sizingId: sizing.id });
    const aBytes = (await store.get(a.blobKey))!.bytes;
    const b = await issueDatasheet(engineer, { sizingId: sizing.id, note: 'Design margin reviewed' });
    expect([a.revision, b.revision]).toEqual(['A', 'B']);
    expect(b.number).toBe(a.number);
    expect(b.blobKey).not.toBe(a.blobKey);
    expect(a.blobKey.startsWith(`accounts/${account.id}/datasheets/${a.number}/A-`)).toBe(true);
    const [aRow] = await db.select().from(datasheetRevisions).where(eq(datasheetRevisions.id, a.revisionId));
    const aAgain = (await store.get(a.blobKey))!.bytes;
    expect(Buffer.compare(aAgain, aBytes)).toBe(0);
    expect(sha256Hex(aAgain)).toBe(aRow!.sha256);
    expect(aRow!.sha256).toBe(a.sha256);
    expect(b.sha256).not.toBe(a.sha256);
    const [listed] = await listDatasheets(engineer, { sizingId: sizing.id });
    expect(listed!.revisions.map((r) => [r.revision, r.note])).toEqual([
      ['A', null],
      ['B', 'Design margin reviewed'],
    ]);
    const snapshotB = (
      await db
        .select({ s: datasheetRevisions.snapshot })
        .from(datasheetRevisions)
        .where(eq(datasheetRevisions.id, b.revisionId))
    )[0]!.s as { revisions: { revision: string }[] };
    expect(snapshotB.revisions.map((r) => r.revision)).toEqual(['A', 'B']);
  });

  it('each issue writes its audit entry and queues the mail to the billing contact', async () => {
    const { account, engineer, sizing } = await heaterSizing();
    const a = await issueDatasheet(engineer, { sizingId: sizing.id });
    const audits = await db.select().from(auditLog).where(eq(auditLog.entityId, a.revisionId));
    expect(audits.map((x) => x.action)).toEqual(['datasheet.issued']);
    const mail = await db.select().from(outbox).where(eq(outbox.entityId, a.revisionId));
    expect(mail.map((m) => [m.template, m.toAddress])).toEqual([['datasheet-issued', account.billingContactEmail]]);
  });

  it('the database refuses to change or delete an issued revision', async () => {
    const { engineer, sizing } = await heaterSizing();
    const a = await issueDatasheet(engineer, { sizingId: sizing.id });
    const code = (err: unknown) => (err as { cause?: { code?: string } }).cause?.code;
    // The app's role is never granted changing a revision (42501); below it, the trigger refuses even the
    // schema's owner (23001).
    const owner = new Client({ connectionString: process.env.MIGRATION_DATABASE_URL ?? process.env.DATABASE_URL });
    await owner.connect();
    try {
      const asOwner = await owner
        .query('update datasheet_revisions set note = $1 where id = $2', ['tampered', a.revisionId])
        .catch((e: { code?: string }) => e);
      expect((asOwner as { code?: string }).code).toBe('23001');
      const delOwner = await owner
        .query('delete from datasheet_revisions where id = $1', [a.revisionId])
        .catch((e: { code?: string }) => e);
      expect((delOwner as { code?: string }).code).toBe('23001');
    } finally {
      await owner.end();
    }
    const upd = await db
      .update(datasheetRevisions)
      .set({ note: 'tampered' })
      .where(eq(datasheetRevisions.id, a.revisionId))
      .catch((e: unknown) => e);
    expect(code(upd)).toBe('42501');
    const del = await db
      .delete(datasheetRevisions)
      .where(eq(datasheetRevisions.id, a.revisionId))
      .catch((e: unknown) => e);
    expect(code(del)).toBe('42501');
    const raw = await db
      .execute(sql`update datasheet_revisions set sha256 = ${'0'.repeat(64)} where id = ${a.revisionId}`)
      .catch((e: unknown) => e);
    expect(code(raw)).toBe('42501');
    const [row] = await db
      .select({ note: datasheetRevisions.note, sha256: datasheetRevisions.sha256 })
      .from(datasheetRevisions)
      .where(eq(datasheetRevisions.id, a.revisionId));
    expect(row).toEqual({ note: null, sha256: a.sha256 });
  });

  it('concurrent issues of one sizing get distinct letters in order', async () => {
    const { engineer, sizing } = await heaterSizing();
    const results = await Promise.all([1, 2, 3].map(() => issueDatasheet(engineer, { sizingId: sizing.id })));
    expect(results.map((r) => r.revision).sort()).toEqual(['A', 'B', 'C']);
    expect(new Set(results.map((r) => r.number)).size).toBe(1);
  });

  it('letters run A..Z, then AA..ZZ, and stop there', () => {
    expect(nextRevisionLetter(null)).toBe('A');
    expect(nextRevisionLetter('A')).toBe('B');
    expect(nextRevisionLetter('Z')).toBe('AA');
    expect(nextRevisionLetter('AZ')).toBe('BA');
    expect(nextRevisionLetter('ZY')).toBe('ZZ');
    expect(nextRevisionLetter('ZZ')).toBeNull();
    expect(nextRevisionLetter('a')).toBeNull();
    const all = Array.from({ length: 702 }, (_, i) => revisionLetterAt(i));
    expect(new Set(all).size).toBe(702);
    expect(all.every((l, i) => l !== null && /^[A-Z]{1,2}$/.test(l) && revisionIndexOf(l) === i)).toBe(true);
  });
});
