import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { datasheets, outbox, sizings, sizingVersions } from '@/db/schema';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { listDatasheets } from '@/lib/datasheets/queries';
import { getSizing } from '@/lib/sizings/queries';
import { saveSizing } from '@/lib/sizings/save';
import { listSizingVersions } from '@/lib/sizings/versions';
import { inputChanges } from '@/lib/sizings/version-diff';
import { resendDatasheetEmail } from '@/lib/support/resend';
import { sizingEmails } from '@/lib/support/sizing-record';
import { nitrogenHeater } from '../datasheets/requests';
import { makeAccount, makeUser } from '../helpers/fixtures';

const meta = (accountId: string) => ({
  accountId,
  title: 'Purge heater',
  equipmentTag: 'EH-3301',
  notes: undefined,
  quoteId: undefined,
});

describe('a revision is a version of the same sizing', () => {
  it('keeps the number and id, archives version 1, and issues rev B of the same datasheet', async () => {
    const account = await makeAccount('Versions');
    const engineer = await makeUser('sales_engineer');
    const first = await saveSizing(engineer, meta(account.id), nitrogenHeater);
    const a = await issueDatasheet(engineer, { sizingId: first.id });
    const hotter = { ...nitrogenHeater, outletTemperature: { value: 350, unit: 'degC' } };
    const second = await saveSizing(engineer, { ...meta(account.id), revisedFromId: first.id }, hotter);
    expect(second).toEqual({ id: first.id, number: first.number, version: 2 });
    expect(await db.select().from(sizings).where(eq(sizings.number, first.number))).toHaveLength(1);

    const b = await issueDatasheet(engineer, { sizingId: first.id });
    expect(b.number).toBe(a.number);
    expect([a.revision, b.revision]).toEqual(['A', 'B']);
    expect(await db.select().from(datasheets).where(eq(datasheets.sizingId, first.id))).toHaveLength(1);

    const sizing = await getSizing(engineer, first.id);
    const versions = await listSizingVersions(sizing);
    expect(versions.map((v) => [v.version, v.current])).toEqual([
      [2, true],
      [1, false],
    ]);
    // 350 °C out needs more duty than 300 °C out.
    expect(versions[0]!.headlineKw).toBeGreaterThan(versions[1]!.headlineKw);
    expect(inputChanges(versions[1]!.input, versions[0]!.input)).toEqual([
      { label: 'outletTemperature', before: '300 degC', after: '350 degC' },
    ]);
  });

  it('refuses a revision into another account or of another service, and leaves the record as it was', async () => {
    const account = await makeAccount('Versions');
    const other = await makeAccount('Elsewhere');
    const engineer = await makeUser('sales_engineer');
    const first = await saveSizing(engineer, meta(account.id), nitrogenHeater);
    await expect(saveSizing(engineer, { ...meta(other.id), revisedFromId: first.id }, nitrogenHeater)).rejects.toThrow(
      /another account/,
    );
    expect(await db.select().from(sizingVersions).where(eq(sizingVersions.sizingId, first.id))).toHaveLength(0);
    const [row] = await db.select({ revision: sizings.revision }).from(sizings).where(eq(sizings.id, first.id));
    expect(row?.revision).toBe(1);
  });

  it('keeps a mixture in the order it was entered', async () => {
    const account = await makeAccount('Versions');
    const engineer = await makeUser('sales_engineer');
    const mixture = {
      ...nitrogenHeater,
      gas: { components: { nitrogen: 0.5, methane: 0.3, CO2: 0.2 }, basis: 'mole' },
    };
    const saved = await saveSizing(engineer, meta(account.id), mixture);
    const sizing = await getSizing(engineer, saved.id);
    const gas = (sizing.input as { gas: { components: Record<string, number> } }).gas;
    expect(Object.keys(gas.components)).toEqual(['nitrogen', 'methane', 'CO2']);
  });
});

describe('support resends a chosen revision as a copy', () => {
  it('sends to the chosen address, says copy and superseded, and the e-mail history lists every mail', async () => {
    const account = await makeAccount('Resend');
    const engineer = await makeUser('sales_engineer');
    const support = await makeUser('support');
    const saved = await saveSizing(engineer, meta(account.id), nitrogenHeater);
    const a = await issueDatasheet(engineer, { sizingId: saved.id });
    await issueDatasheet(engineer, { sizingId: saved.id });
    const [ds] = await listDatasheets(engineer, { sizingId: saved.id });
    const revA = ds!.revisions.find((r) => r.revision === 'A')!;
    const sent = await resendDatasheetEmail(support, {
      sizingId: saved.id,
      revisionId: revA.id,
      to: 'site.engineer@customer.example',
    });
    expect(sent).toEqual({ to: 'site.engineer@customer.example', datasheetNumber: a.number, revision: 'A' });
    const [copy] = await db
      .select({ subject: outbox.subject })
      .from(outbox)
      .where(eq(outbox.toAddress, 'site.engineer@customer.example'));
    expect(copy?.subject).toBe(`Copy: Datasheet ${a.number} rev. A (superseded by rev. B)`);
    const log = await sizingEmails(support, saved.id);
    // Two issue notices to the billing contact and the copy.
    expect(log?.map((e) => e.subject).sort()).toEqual(
      [
        `Copy: Datasheet ${a.number} rev. A (superseded by rev. B)`,
        `Datasheet ${a.number} rev. A issued`,
        `Datasheet ${a.number} rev. B issued`,
      ].sort(),
    );
  });

  it('refuses a revision of another datasheet', async () => {
    const account = await makeAccount('Resend');
    const engineer = await makeUser('sales_engineer');
    const support = await makeUser('support');
    const one = await saveSizing(engineer, meta(account.id), nitrogenHeater);
    const two = await saveSizing(engineer, meta(account.id), nitrogenHeater);
    await issueDatasheet(engineer, { sizingId: one.id });
    const b = await issueDatasheet(engineer, { sizingId: two.id });
    await expect(resendDatasheetEmail(support, { sizingId: one.id, revisionId: b.revisionId })).rejects.toThrow(
      /Choose a revision/,
    );
  });
});
