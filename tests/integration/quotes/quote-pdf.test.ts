import { readFileSync } from 'node:fs';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import * as fontkit from 'fontkit';
import { Client } from 'pg';
import { extractText } from 'unpdf';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { auditLog, quoteDocuments } from '@/db/schema';
import { getBlobStore } from '@/lib/blob';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { bindQuoteDocument } from '@/lib/quotes/document/bind';
import { getQuoteDocumentDownload } from '@/lib/quotes/document/download';
import { pdfPageCount } from '@/lib/quotes/document/merge';
import { sendQuote, setQuoteStatus } from '@/lib/quotes/mutations';
import { getQuote } from '@/lib/quotes/queries';
import { formatHeadline } from '@/lib/sizings/headline';
import { sentQuoteWithDatasheets } from './quote-pdf-fixture';

type Fixture = Awaited<ReturnType<typeof sentQuoteWithDatasheets>>;
let f: Fixture;

const FONT_DIR = path.join(process.cwd(), 'lib', 'datasheets', 'fonts');
const printable = [
  'ibm-plex-sans-latin-400-normal.ttf',
  'ibm-plex-sans-latin-600-normal.ttf',
  'ibm-plex-mono-latin-400-normal.ttf',
]
  .map((file) => new Set(fontkit.create(readFileSync(path.join(FONT_DIR, file))).characterSet))
  .reduce((a, b) => new Set([...a].filter((c) => b.has(c))));

async function pagesOf(bytes: Uint8Array): Promise<string[]> {
  const { text } = await extractText(new Uint8Array(bytes), { mergePages: false });
  // Lines wrap at spaces only (hyphenation is off), so collapsing whitespace restores every phrase.
  return text.map((t) => t.replace(/\s+/g, ' ').trim());
}

async function revisionBytes(revisionId: string): Promise<Buffer> {
  const dl = await getRevisionDownload(f.engineer, revisionId);
  if (dl.status !== 'ok') throw new Error(`revision download ${dl.status}`);
  return dl.bytes;
}

async function editionBytes(documentId: string): Promise<Buffer> {
  const dl = await getQuoteDocumentDownload(f.engineer, documentId);
  if (dl.status !== 'ok') throw new Error(`quote PDF download ${dl.status}`);
  return dl.bytes;
}

beforeAll(async () => {
  f = await sentQuoteWithDatasheets();
});

describe('the quote as one PDF', () => {
  it('is a cover sheet with lines and totals, then every page of each current datasheet exactly as issued', async () => {
    const { edition, created } = await bindQuoteDocument(f.engineer, f.quoteId);
    expect(created).toBe(true);
    expect(edition.edition).toBe(1);
    const bytes = await editionBytes(edition.id);
    const pages = await pagesOf(bytes);
    const heaterB = await pagesOf(await revisionBytes(f.heaterB.revisionId));
    const compressorA = await pagesOf(await revisionBytes(f.compressorA.revisionId));
    const coverPages = pages.filter((p) => p.includes('Quote cover sheet')).length;
    expect(coverPages).toBeGreaterThanOrEqual(1);
    expect(pages.length).toBe(coverPages + heaterB.length + compressorA.length);
    expect(edition.pageCount).toBe(pages.length);
    expect(await pdfPageCount(bytes)).toBe(pages.length);
    // The appended pages read exactly as the stored revisions do, in line order; the superseded rev A is absent.
    expect(pages.slice(coverPages)).toEqual([...heaterB, ...compressorA]);
    expect(pages.join(' ')).not.toContain(`${f.heaterA.number} Rev. A`);

    const cover = pages.slice(0, coverPages).join(' ');
    for (const s of [
      f.account.name,
      'Edition 1',
      'Sent',
      'US customary',
      'Kiln line, Z ~ 0.99 at inlet',
      `${f.heaterB.number} Rev. B`,
      `${f.compressorA.number} Rev. A`,
      'None issued yet',
      'EH-8101',
      'K-8102',
      'EH-8103',
      'lb/h',
      'Preliminary sizing',
      'Hot surfaces',
    ])
      expect(cover).toContain(s);
    // Headlines follow the rounding rule of every other page (formatHeadline); 3 x USD 1,250.10 = USD 3,750.30 [calc].
    for (const l of (await getQuote(f.engineer, f.quoteId)).lines)
      expect(cover).toContain(formatHeadline(l.service, l.headlineKw));
    expect(cover).toContain('USD 1,250.10');
    expect(cover).toContain('USD 3,750.30 for the 1 priced line (2 not priced)');
    const missing = [...new Set([...pages.join('').replace(/\s+/g, '')])].filter(
      (c) => !printable.has(c.codePointAt(0)!),
    );
    expect(missing).toEqual([]);

    const [row] = await db.select().from(quoteDocuments).where(eq(quoteDocuments.id, edition.id));
    expect(row!.lines.map((l) => l.revisionId)).toEqual([f.heaterB.revisionId, f.compressorA.revisionId, null]);
    expect(row!.blobKey.startsWith(`accounts/${f.account.id}/`)).toBe(true);
    expect(await getBlobStore().exists(row!.blobKey)).toBe(true);
    const audits = await db.select().from(auditLog).where(eq(auditLog.entityId, edition.id));
    expect(audits.map((a) => a.action)).toContain('quote.document_bound');
  });

  it('an unchanged quote answers its latest edition; a new datasheet revision or status makes the next edition', async () => {
    const again = await bindQuoteDocument(f.engineer, f.quoteId);
    expect(again.created).toBe(false);
    expect(again.edition.edition).toBe(1);
    const compressorB = await issueDatasheet(f.engineer, { sizingId: f.compressor.id });
    const next = await bindQuoteDocument(f.engineer, f.quoteId);
    expect(next.created).toBe(true);
    expect(next.edition.edition).toBe(2);
    expect(next.edition.lines.map((l) => l.revisionId)).toEqual([f.heaterB.revisionId, compressorB.revisionId, null]);
    const rows = await db.select().from(quoteDocuments).where(eq(quoteDocuments.quoteId, f.quoteId));
    expect(rows.map((r) => r.edition).sort()).toEqual([1, 2]);
    expect(rows.find((r) => r.edition === 1)!.lines[1]!.revisionId).toBe(f.compressorA.revisionId);
    // Sending the same quote again changes nothing printed; closing it as won changes its status on the cover.
    await sendQuote(f.engineer, f.quoteId);
    expect((await bindQuoteDocument(f.engineer, f.quoteId)).created).toBe(false);
    await setQuoteStatus(f.engineer, f.quoteId, 'won');
    const won = await bindQuoteDocument(f.engineer, f.quoteId);
    expect(won).toMatchObject({ created: true, edition: { edition: 3 } });
    const cover = (await pagesOf(await editionBytes(won.edition.id)))[0]!;
    expect(cover).toMatch(/STATUS Won/i);
  });

  it('the database refuses to change or delete a stored edition, even for the schema owner', async () => {
    const [row] = await db.select().from(quoteDocuments).where(eq(quoteDocuments.quoteId, f.quoteId)).limit(1);
    const code = (err: unknown) => (err as { cause?: { code?: string } }).cause?.code;
    // The app's role is never granted it (42501); the trigger refuses the owner too (23001, restrict_violation).
    const upd = await db
      .update(quoteDocuments)
      .set({ pageCount: 1 })
      .where(eq(quoteDocuments.id, row!.id))
      .catch((e: unknown) => e);
    expect(code(upd)).toBe('42501');
    const del = await db
      .delete(quoteDocuments)
      .where(eq(quoteDocuments.id, row!.id))
      .catch((e: unknown) => e);
    expect(code(del)).toBe('42501');
    const owner = new Client({ connectionString: process.env.MIGRATION_DATABASE_URL ?? process.env.DATABASE_URL });
    await owner.connect();
    try {
      for (const statement of [
        'update quote_documents set page_count = 1 where id = $1',
        'delete from quote_documents where id = $1',
      ]) {
        const err = await owner.query(statement, [row!.id]).catch((e: { code?: string }) => e);
        expect((err as { code?: string }).code).toBe('23001');
      }
    } finally {
      await owner.end();
    }
  });
});
