import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { actAs } from '../helpers/session';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { db } from '@/db';
import { apiKeys, auditLog, users } from '@/db/schema';
import { createApiKeyAction, revokeApiKeyAction } from '@/app/(desk)/api-keys/actions';
import { POST } from '@/app/api/v1/calculate/route';
import { hashApiKey } from '@/lib/api-keys/format';
import { listApiKeys } from '@/lib/api-keys/queries';
import { API_KEY_ACTIVE_LIMIT } from '@/lib/api-keys/schema';
import { heaterJson } from '../helpers/heater-json';

const body = heaterJson({
  gas: 'nitrogen',
  flowKgH: 400,
  inletC: 20,
  pressure: { value: 5, unit: 'barg' },
  outletC: 180,
});
const calc = (authorization?: string) =>
  POST(
    new Request('http://localhost/api/v1/calculate', {
      method: 'POST',
      body,
      headers: { 'x-forwarded-for': '192.0.2.77', ...(authorization ? { authorization } : {}) },
    }),
  );

type Created = { id: string; key: string; prefix: string };
async function create(user: { id: string; role: string }, name: string, perMinute?: number): Promise<Created> {
  await actAs(user);
  const res = await createApiKeyAction({ name, perMinute });
  if (!res.ok) throw new Error(`create refused: ${JSON.stringify(res.errors)}`);
  return res.data;
}

describe('API keys', () => {
  it('a customer creates a key shown once, and a request with it is counted and attributed to the account', async () => {
    const acct = await makeAccount('Keyholder');
    const customer = await makeUser('customer', acct.id);
    const made = await create(customer, 'Estimating workbook', 50);
    expect(made.key).toMatch(/^dwk_[a-z2-9]{8}_[A-Za-z0-9_-]{43}$/);
    expect(made.key.startsWith(`${made.prefix}_`)).toBe(true);

    // Stored hashed: the key itself is nowhere in the row.
    const [row] = await db.select().from(apiKeys).where(eq(apiKeys.id, made.id));
    expect(row?.secretHash).toBe(hashApiKey(made.key));
    expect(JSON.stringify(row)).not.toContain(made.key.slice(made.prefix.length + 1));
    expect(row?.accountId).toBe(acct.id);

    const res = await calc(`Bearer ${made.key}`);
    expect(res.status).toBe(200);
    expect(res.headers.get('ratelimit-limit')).toBe('50');
    expect(res.headers.get('ratelimit-policy')).toBe('50;w=60;comment="per API key"');
    expect((await calc(`Bearer ${made.key}`)).status).toBe(200);

    const [listed] = await listApiKeys(customer);
    expect(listed).toMatchObject({ id: made.id, name: 'Estimating workbook', perMinute: 50, usedToday: 2 });
    expect(listed?.lastUsedAt).toBeInstanceOf(Date);
    expect(JSON.stringify(listed)).not.toContain(made.key);

    const entries = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, made.id), eq(auditLog.action, 'api.calculated')));
    expect(entries).toHaveLength(2);
    expect(entries[0]).toMatchObject({ accountId: acct.id, actorUserId: customer.id, actorRole: 'customer' });
    expect(entries[0]?.detail).toMatchObject({ key: made.prefix, keyName: 'Estimating workbook', status: 200 });
    expect(entries[0]?.detail).toMatchObject({ service: 'heater' });
  });

  it('each key has its own limit, independent of the address and of other keys', async () => {
    const acct = await makeAccount('Scripted');
    const customer = await makeUser('customer', acct.id);
    const tight = await create(customer, 'Nightly check', 3);
    const other = await create(customer, 'Quote tool', 100);
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await calc(`Bearer ${tight.key}`)).status);
    expect(statuses).toEqual([200, 200, 200, 429]);
    expect((await calc(`Bearer ${other.key}`)).status).toBe(200);
  });

  it('a revoked key, an unknown key, a malformed one and a disabled owner’s key get 401', async () => {
    const engineer = await makeUser('sales_engineer');
    const made = await create(engineer, 'Proposal generator');
    expect((await calc(`Bearer ${made.key}`)).status).toBe(200);
    await actAs(engineer);
    expect(await revokeApiKeyAction({ keyId: made.id })).toMatchObject({ ok: true });
    const refused = await calc(`Bearer ${made.key}`);
    expect(refused.status).toBe(401);
    expect(refused.headers.get('www-authenticate')).toMatch(/^Bearer/);
    expect(((await refused.json()) as { errors: { path: string }[] }).errors[0]?.path).toBe('authorization');

    const forged = made.key.slice(0, -3) + (made.key.endsWith('AAA') ? 'BBB' : 'AAA');
    for (const auth of [`Bearer ${forged}`, 'Bearer not-a-key', 'Bearer', 'Basic Zm9vOmJhcg=='])
      expect((await calc(auth)).status, auth).toBe(401);

    const live = await create(engineer, 'Second tool');
    await db.update(users).set({ disabledAt: new Date() }).where(eq(users.id, engineer.id));
    expect((await calc(`Bearer ${live.key}`)).status).toBe(401);
  });

  it('keys are scoped: staff see their own, customers their account’s; another’s key is not found', async () => {
    const acct = await makeAccount('Scoped');
    const customer = await makeUser('customer', acct.id);
    const colleague = await makeUser('customer', acct.id);
    const outsider = await makeUser('customer', (await makeAccount('Elsewhere')).id);
    const engineer = await makeUser('sales_engineer');
    const shared = await create(customer, 'Shared tool');
    const own = await create(engineer, 'Engineer script');
    expect((await listApiKeys(colleague)).map((k) => k.id)).toEqual([shared.id]);
    expect((await listApiKeys(engineer)).map((k) => k.id)).toEqual([own.id]);
    expect(await listApiKeys(outsider)).toEqual([]);
    await actAs(outsider);
    expect(await revokeApiKeyAction({ keyId: shared.id })).toMatchObject({ ok: false, status: 404 });
    await actAs(engineer);
    expect(await revokeApiKeyAction({ keyId: shared.id })).toMatchObject({ ok: false, status: 404 });
    await actAs(colleague);
    expect(await revokeApiKeyAction({ keyId: shared.id })).toMatchObject({ ok: true });
  });

  it('refuses a bad name or limit by field, and more than the allowed number of active keys', async () => {
    const engineer = await makeUser('sales_engineer');
    await actAs(engineer);
    const bad = await createApiKeyAction({ name: '', perMinute: 5000 });
    expect(bad).toMatchObject({ ok: false, status: 400 });
    if (!bad.ok) expect([...new Set(bad.errors.map((e) => e.path))].sort()).toEqual(['name', 'perMinute']);
    for (let i = 0; i < API_KEY_ACTIVE_LIMIT; i++) await create(engineer, `Tool ${i}`);
    await actAs(engineer);
    expect(await createApiKeyAction({ name: 'One too many' })).toMatchObject({ ok: false, status: 409 });
  });
});
