import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DatasheetCard } from '@/app/(desk)/datasheets/_components/datasheet-card';
import type { DatasheetSummary } from '@/lib/datasheets/queries';

const ds: DatasheetSummary = {
  id: '0d5f7d35-0c38-4f7e-9a8e-3b1a8d6f2c11',
  number: 'DS26-0777',
  accountId: 'a',
  accountName: 'Fenwick Maltings',
  sizingId: 's',
  sizingTitle: 'Kiln air heater',
  equipmentTag: 'EH-9001',
  service: 'heater',
  createdAt: new Date('2026-03-02T10:00:00Z'),
  revisions: [
    {
      id: '11111111-1111-4111-8111-111111111111',
      revision: 'A',
      issuedAt: new Date('2026-03-02T10:00:00Z'),
      sha256: 'ab'.repeat(32),
      byteSize: 33_000,
      note: null,
      issuedByName: 'Ines Marlow',
    },
    {
      id: '22222222-2222-4222-8222-222222222222',
      revision: 'B',
      issuedAt: new Date('2026-03-09T10:00:00Z'),
      sha256: 'cd'.repeat(32),
      byteSize: 34_000,
      note: 'Margin raised',
      issuedByName: 'Ines Marlow',
    },
  ],
};

const html = (unlocked: boolean) =>
  renderToStaticMarkup(createElement(DatasheetCard, { ds, unlocked, showAccount: true }));

describe('the datasheet list card', () => {
  it('offers one download per revision when unlocked, with dates and hash prefixes', () => {
    const out = html(true);
    expect(out.match(/data-testid="datasheet-download"/g)).toHaveLength(2);
    for (const r of ds.revisions) expect(out).toContain(`href="/api/v1/datasheets/${r.id}"`);
    expect(out).toContain('2026-03-09');
    expect(out).toContain('cdcdcdcdcdcd…');
    expect(out).not.toContain('datasheet-locked');
  });

  it('shows a locked preview with the title, tag, revision and the way to subscribe, and no download link', () => {
    const out = html(false);
    expect(out).not.toContain('datasheet-download');
    expect(out).not.toContain('/api/v1/datasheets/');
    const locked = out.slice(out.indexOf('data-testid="datasheet-locked"'));
    expect(locked).toContain('DS26-0777 rev. B');
    expect(locked).toContain('Kiln air heater');
    expect(locked).toContain('EH-9001');
    expect(locked).toMatch(/href="\/billing"[^>]*>Subscribe to download</);
  });
});
