import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { createAccount } from '@/lib/accounts/mutations';
import { signUpCustomer } from '@/lib/accounts/sign-up';
import { makeAccount, makeUser } from '../helpers/fixtures';

const fields = (name: string) => ({
  name,
  site: undefined,
  billingContactName: undefined,
  billingContactEmail: undefined,
  unitSystem: 'si' as const,
  currency: 'USD',
});

describe('one company, one account', () => {
  it('staff are stopped at a same-named account (case and spacing ignored) unless they confirm', async () => {
    const existing = await makeAccount('Quarry Hill Gas');
    const engineer = await makeUser('sales_engineer');
    const sameName = `  ${existing.name.toUpperCase().replace(/ /g, '  ')} `;
    await expect(createAccount(engineer, fields(sameName))).rejects.toMatchObject({
      status: 409,
      issues: expect.arrayContaining([{ path: 'name', message: 'An account with this name already exists.' }]),
    });
    const second = await createAccount(engineer, { ...fields(sameName), confirmDuplicateName: true });
    expect(second.id).not.toBe(existing.id);
  });

  it('self-serve sign-up for a company that already has an account is refused with the way to join it', async () => {
    const existing = await makeAccount('Marsh Lane Chemicals');
    await expect(
      signUpCustomer({
        name: 'New Person',
        email: `new-${randomUUID().slice(0, 6)}@customer.example`,
        password: 'a long enough password',
        company: existing.name.toLowerCase(),
      }),
    ).rejects.toThrow(/already has a Dutywise account\. Ask a colleague there/);
  });

  it('a US customary account given its barometric pressure in psia stores it in kPa', async () => {
    const engineer = await makeUser('sales_engineer');
    const { id } = await createAccount(engineer, {
      ...fields(`Psia Works ${randomUUID().slice(0, 6)}`),
      unitSystem: 'us',
      barometricPressurePsia: 14.0,
    });
    const { getAccount } = await import('@/lib/accounts/queries');
    const a = await getAccount(engineer, id);
    // 14.0 psi × 6.894757 kPa/psi [pub: NIST SP 811] = 96.53 kPa.
    expect(a.barometricPressureKpa).toBeCloseTo(96.527, 2);
    expect(a.unitSystem).toBe('us');
  });
});
