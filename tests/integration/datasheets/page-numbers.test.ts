import { extractText } from 'unpdf';
import { describe, expect, it } from 'vitest';
import { PRELIMINARY_STATEMENT } from '@/lib/datasheets/pdf/page-frame';
import { countPdfPages, renderDatasheetPdf } from '@/lib/datasheets/render';
import { revisionLetterAt } from '@/lib/datasheets/revision-letter';
import type { DatasheetSnapshot } from '@/lib/datasheets/snapshot';
import { calculate } from '@/lib/engine';
import { nitrogenHeater } from './requests';

function snapshot(revisions: number): DatasheetSnapshot {
  const result = calculate(nitrogenHeater);
  const at = '2026-04-01T09:00:00.000Z';
  return {
    schemaVersion: 1,
    datasheet: { number: 'DS26-9001', revision: 'A', issuedAt: at, note: null, issuedByName: 'Test engineer' },
    account: { id: '5b7c1c5e-8f0e-4d5f-9a51-3f1f7c2b9e10', name: 'Numbering Works', site: null },
    sizing: {
      id: 'x',
      number: 'S26-09001',
      title: 'Page numbering check',
      equipmentTag: 'EH-9901',
      service: 'heater',
      gasLabel: 'nitrogen',
      notes: null,
      engineVersion: result.engineVersion,
      revision: 1,
      createdAt: at,
    },
    input: nitrogenHeater,
    result,
    revisions: Array.from({ length: revisions }, (_, i) => ({
      revision: revisionLetterAt(i)!,
      issuedAt: at,
      note: `Revision note ${i}: reviewed with the site`,
      issuedByName: 'Test engineer',
    })),
  };
}

async function pagesOf(bytes: Buffer) {
  const { text, totalPages } = await extractText(new Uint8Array(bytes), { mergePages: true });
  return { text: text.replace(/\s+/g, ' '), totalPages };
}

function expectNumbered(text: string, totalPages: number) {
  expect(text.split(PRELIMINARY_STATEMENT).length - 1).toBe(totalPages);
  for (let p = 1; p <= totalPages; p++) expect(text).toContain(`Page ${p} of ${totalPages}`);
  expect(text).not.toContain(`Page ${totalPages + 1} of`);
}

describe('page numbers are right on every page', () => {
  it('with planned pages, however long the revision table grows', async () => {
    for (const n of [1, 40]) {
      const bytes = await renderDatasheetPdf(snapshot(n));
      const { text, totalPages } = await pagesOf(bytes);
      expect(countPdfPages(bytes)).toBe(totalPages);
      if (n === 40) expect(totalPages).toBeGreaterThan(2);
      expectNumbered(text, totalPages);
    }
  });

  it('when the plan undershoots, the sheet is rendered again flowing and still numbered right', async () => {
    // A page capacity far too large packs everything onto one planned page, which cannot hold it.
    const bytes = await renderDatasheetPdf(snapshot(3), { capacityPt: 5000 });
    const { text, totalPages } = await pagesOf(bytes);
    expect(totalPages).toBeGreaterThan(1);
    expectNumbered(text, totalPages);
  });

  it('the flowing layout carries the same content as the planned one', async () => {
    const planned = await pagesOf(await renderDatasheetPdf(snapshot(5)));
    const flowing = await pagesOf(await renderDatasheetPdf(snapshot(5), { layout: 'flow' }));
    expectNumbered(flowing.text, flowing.totalPages);
    // Without the running head and footer, both layouts read the same from start to end.
    const frame = [
      /DUTYWISE Equipment datasheet DS26-9001 Rev\. A EH-9901/g,
      /DS26-9001 Rev\. A, issued 2026-04-01 for Numbering Works/g,
      /Page \d+ of \d+/g,
    ];
    const body = (t: string) =>
      frame.reduce((acc, re) => acc.replace(re, ''), t.split(PRELIMINARY_STATEMENT).join('')).replace(/\s+/g, '');
    expect(body(flowing.text)).toBe(body(planned.text));
    expect(body(planned.text)).toContain('Revisionnote4:reviewedwiththesite');
  });
});
