import { describe, expect, it } from 'vitest';
import '../helpers/session';
import { inviteMemberAction } from '@/app/(desk)/accounts/[accountId]/actions';
import { saveSizingAction } from '@/app/(desk)/size/actions';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { grantSubscription, makeEngineSizing } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { actAs } from '../helpers/session';
import { nitrogenHeater } from '../datasheets/requests';

describe('what a customer may do', () => {
  it('saving sizings to the account needs an active subscription, as the plans page says', async () => {
    const acct = await makeAccount('Unsubscribed');
    const customer = await makeUser('customer', acct.id);
    await actAs(customer);
    const payload = { accountId: acct.id, title: 'Dryer air heater', input: nitrogenHeater };
    const refused = await saveSizingAction(payload);
    expect(refused).toMatchObject({ ok: false, status: 402 });
    if (!refused.ok) expect(refused.errors[0]?.message).toMatch(/needs an active subscription.*\/billing/);
    await grantSubscription(acct.id);
    expect(await saveSizingAction(payload)).toMatchObject({ ok: true });
    // Vendor staff save to any account, subscribed or not.
    const other = await makeAccount('Prospect');
    await actAs(await makeUser('sales_engineer'));
    expect(await saveSizingAction({ ...payload, accountId: other.id })).toMatchObject({ ok: true });
  });

  it('only vendor staff issue datasheet revisions: a customer may not issue one, of a vendor sheet or of its own', async () => {
    const acct = await makeAccount('Revisions');
    const engineer = await makeUser('sales_engineer');
    const customer = await makeUser('customer', acct.id);
    const vendors = await makeEngineSizing(engineer, acct.id, nitrogenHeater, { title: 'Vendor sheet', tag: 'EH-1' });
    await issueDatasheet(engineer, { sizingId: vendors.id });
    await expect(issueDatasheet(customer, { sizingId: vendors.id, note: 'Customer edit' })).rejects.toMatchObject({
      status: 403,
      message: expect.stringMatching(/does not allow issuing datasheets/),
    });
    const own = await makeEngineSizing(customer, acct.id, nitrogenHeater, { title: 'Own sheet', tag: 'EH-2' });
    await expect(issueDatasheet(customer, { sizingId: own.id })).rejects.toMatchObject({ status: 403 });
    // The vendor issues the customer's own sizing as its datasheet.
    expect((await issueDatasheet(engineer, { sizingId: own.id })).revision).toBe('A');
    expect((await issueDatasheet(engineer, { sizingId: vendors.id })).revision).toBe('B');
  });

  it('the inviter is not shown the invitation link outside demo mode', async () => {
    const acct = await makeAccount('Inviting');
    await actAs(await makeUser('sales_engineer'));
    const res = await inviteMemberAction({ accountId: acct.id, email: 'colleague@plant.example' });
    expect(res).toEqual({ ok: true, data: { email: 'colleague@plant.example', inviteUrl: null } });
  });
});
