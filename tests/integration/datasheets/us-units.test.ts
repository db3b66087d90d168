import { eq } from 'drizzle-orm';
import { extractText } from 'unpdf';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { accounts } from '@/db/schema';
import { getRevisionDownload } from '@/lib/datasheets/download';
import { formatFigure } from '@/lib/datasheets/format';
import { issueDatasheet } from '@/lib/datasheets/issue';
import type { HeaterResult } from '@/lib/engine';
import { KG_PER_LB } from '@/lib/units';
import { makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { airTwoStage, nitrogenHeater } from './requests';

async function sheetText(request: Record<string, unknown>, unitSystem: 'si' | 'us') {
  const account = await makeAccount('Units');
  await db.update(accounts).set({ unitSystem }).where(eq(accounts.id, account.id));
  const engineer = await makeUser('sales_engineer');
  const sizing = await makeEngineSizing(engineer, account.id, request, { title: 'Units check', tag: 'U-1' });
  const issued = await issueDatasheet(engineer, { sizingId: sizing.id });
  const dl = await getRevisionDownload(engineer, issued.revisionId);
  if (dl.status !== 'ok') throw new Error(dl.status);
  const { text } = await extractText(new Uint8Array(dl.bytes), { mergePages: true });
  return { text: text.replace(/\s+/g, ' '), result: sizing.result };
}

describe("a datasheet is printed in its account's units", () => {
  it('a US customary heater sheet: °F, psia and lb/h at about four significant figures', async () => {
    const { text, result } = await sheetText(nitrogenHeater, 'us');
    const h = (result as HeaterResult).heater;
    // 300 °C is 572.0 °F [pub: °F = 1.8 °C + 32, NIST SP 811 appendix B].
    expect(text).toContain('572.0 °F');
    // 1000 kg/h over 0.45359237 kg/lb [pub: NIST SP 811] = 2204.6 lb/h, printed to four figures.
    expect(KG_PER_LB).toBe(0.45359237);
    expect(text).toContain(`Mass flow ${formatFigure(1000 / KG_PER_LB)} lb/h`);
    expect(text).toContain('Mass flow 2,205 lb/h 0.6124 lb/s');
    // Entered values stay as entered; the computed column beside them is in the account's units.
    expect(text).toContain('Outlet temperature (target) 300 °C 572.0 °F');
    expect(text).toContain('Temperature rise 504.0 °F');
    // 2 barg is 29.01 psi above 14.696 psia [pub: 1 bar = 14.5038 psi, NIST SP 811]: 43.70 psia at four figures.
    expect(text).toMatch(/Inlet pressure 2 barg 43\.70 psia/);
    expect(text).not.toMatch(/\d\.\d{4,} psia/);
    expect(h.outletTemperatureC).toBeCloseTo(300, 6);
  });

  it('a US customary compressor sheet heads its stage table in psia, °F and lb/h', async () => {
    const { text } = await sheetText(airTwoStage, 'us');
    for (const s of ['p in psia', 'T in °F', 'm lb/h']) expect(text).toContain(s);
    expect(text).not.toContain('kPa a');
  });

  it('an SI account keeps °C, kPa and kg/h', async () => {
    const { text } = await sheetText(nitrogenHeater, 'si');
    expect(text).toContain('300.0 °C');
    expect(text).toContain('1,000 kg/h');
    expect(text).not.toContain('572.0 °F');
    expect(text).not.toContain('lb/h');
  });
});
