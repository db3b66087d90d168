import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { auditLog } from '@/db/schema';
import { AUDIT_PAGE_SIZE, auditFilterSchema, listAuditEntries } from '@/lib/audit/queries';
import { makeAccount, makeUser } from '../helpers/fixtures';

describe('audit trail query', () => {
  it('support and admins read it; sales engineers and customers are refused', async () => {
    const acct = await makeAccount();
    await expect(listAuditEntries(await makeUser('support'))).resolves.toBeInstanceOf(Array);
    await expect(listAuditEntries(await makeUser('admin'))).resolves.toBeInstanceOf(Array);
    await expect(listAuditEntries(await makeUser('sales_engineer'))).rejects.toMatchObject({ code: 'forbidden' });
    await expect(listAuditEntries(await makeUser('customer', acct.id))).rejects.toMatchObject({ code: 'forbidden' });
  });

  it("filters to one entity, newest first, with the actor's name and the account's name", async () => {
    const acct = await makeAccount('Audited');
    const engineer = await makeUser('sales_engineer');
    const entityId = randomUUID();
    const t0 = Date.now() - 60_000;
    await db.insert(auditLog).values([
      {
        at: new Date(t0),
        actorUserId: engineer.id,
        actorRole: 'sales_engineer',
        action: 'quote.created',
        entityType: 'quote',
        entityId,
        accountId: acct.id,
      },
      {
        at: new Date(t0 + 1000),
        actorUserId: engineer.id,
        actorRole: 'sales_engineer',
        action: 'quote.sent',
        entityType: 'quote',
        entityId,
        accountId: acct.id,
      },
      {
        at: new Date(t0 + 2000),
        actorUserId: engineer.id,
        actorRole: 'sales_engineer',
        action: 'quote.created',
        entityType: 'quote',
        entityId: randomUUID(),
        accountId: acct.id,
      },
    ]);
    const rows = await listAuditEntries(await makeUser('support'), { entityType: 'quote', entityId });
    expect(rows.map((r) => r.action)).toEqual(['quote.sent', 'quote.created']);
    expect(rows[0]).toMatchObject({
      actorName: engineer.name,
      actorEmail: engineer.email,
      accountName: acct.name,
      entityId,
    });
  });

  it(`returns at most ${AUDIT_PAGE_SIZE} entries, dropping the oldest`, async () => {
    const entityId = randomUUID();
    const t0 = Date.now() - 3_600_000;
    await db.insert(auditLog).values(
      Array.from({ length: AUDIT_PAGE_SIZE + 5 }, (_, i) => ({
        at: new Date(t0 + i * 1000),
        action: `probe.${i}`,
        entityType: 'probe',
        entityId,
      })),
    );
    const rows = await listAuditEntries(await makeUser('admin'), { entityId });
    expect(rows).toHaveLength(AUDIT_PAGE_SIZE);
    expect(rows[0]?.action).toBe(`probe.${AUDIT_PAGE_SIZE + 4}`);
    expect(rows.at(-1)?.action).toBe('probe.5');
  });

  it('drops malformed URL filters instead of failing', () => {
    expect(auditFilterSchema.parse({ entityType: "quote'; drop table", entityId: 'x'.repeat(101) })).toEqual({
      entityType: undefined,
      entityId: undefined,
    });
    expect(auditFilterSchema.parse({ entityType: 'quote', entityId: ' abc ' })).toEqual({
      entityType: 'quote',
      entityId: 'abc',
    });
  });
});
