import { readFileSync } from 'node:fs';
import path from 'node:path';
import * as fontkit from 'fontkit';
import { extractText } from 'unpdf';
import { describe, expect, it } from 'vitest';
import { renderDatasheetPdf } from '@/lib/datasheets/render';
import type { DatasheetSnapshot } from '@/lib/datasheets/snapshot';
import { calculate, type SizingResult } from '@/lib/engine';
import { airTwoStage } from './requests';

const FONT_DIR = path.join(process.cwd(), 'lib', 'datasheets', 'fonts');
// A character is printable when the face it is set in has it; the sheet uses all three, so require every one.
const printable = [
  'ibm-plex-sans-latin-400-normal.ttf',
  'ibm-plex-sans-latin-600-normal.ttf',
  'ibm-plex-mono-latin-400-normal.ttf',
]
  .map((f) => new Set(fontkit.create(readFileSync(path.join(FONT_DIR, f))).characterSet))
  .reduce((a, b) => new Set([...a].filter((c) => b.has(c))));

function snapshotOf(result: SizingResult, input: unknown): DatasheetSnapshot {
  const issuedAt = '2026-03-07T09:00:00.000Z';
  return {
    schemaVersion: 1,
    datasheet: {
      number: 'DS26-0001',
      revision: 'A',
      issuedAt,
      note: 'Z ≈ 0.960 at inlet; η ≥ 0.78',
      issuedByName: 'Ines Ortuño',
    },
    account: { id: '00000000-0000-4000-8000-000000000000', name: 'Łódź Glassworks', site: 'Kiln 2 – north bay' },
    sizing: {
      id: '00000000-0000-4000-8000-000000000001',
      number: 'S26-00001',
      title: 'Recycle compressor (ρ check)',
      equipmentTag: 'K-4101',
      service: result.service,
      gasLabel: result.gas.label,
      notes: null,
      engineVersion: 'test',
      revision: 1,
      createdAt: issuedAt,
    },
    input,
    result: {
      ...result,
      warnings: [
        ...result.warnings,
        { code: 'test', severity: 'info', message: 'Z ≈ 0.96 and κ ≈ 1.31 → real-gas head within 2 ‰' },
      ],
    } as SizingResult,
    revisions: [{ revision: 'A', issuedAt, note: 'First issue', issuedByName: 'Ines Ortuño' }],
  };
}

describe('every character a datasheet prints is in its fonts', () => {
  it('a real-gas compressor sheet with Greek, approx signs and arrows in its text', async () => {
    const input = { ...airTwoStage, equationOfState: 'peng-robinson' };
    const bytes = await renderDatasheetPdf(snapshotOf(calculate(input), input));
    const { text } = await extractText(new Uint8Array(bytes), { mergePages: true });
    const missing = [...new Set([...text.replace(/\s+/g, '')])].filter((c) => !printable.has(c.codePointAt(0)!));
    expect(missing).toEqual([]);
    expect(text).toContain('Z ~ 0.96 and kappa ~ 1.31 -> real-gas head');
  });
});
