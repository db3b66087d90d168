import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { userSessions } from '@/db/schema';
import { loadUser } from '@/lib/auth/load-user';
import { closeSession } from '@/lib/auth/local/session-store';
import { makeAccount, makeUser } from '../helpers/fixtures';

async function sessionOf(userId: string): Promise<string> {
  const [row] = await db
    .insert(userSessions)
    .values({ userId, expiresAt: new Date(Date.now() + 3_600_000) })
    .returning({ id: userSessions.id });
  return row!.id;
}

describe('session reads made at the same moment', () => {
  it('each request gets its own person, and a closed or borrowed session gets nobody, in one shared read', async () => {
    const acct = await makeAccount('Sessions');
    const people = await Promise.all([makeUser('customer', acct.id), makeUser('support'), makeUser('sales_engineer')]);
    const sessions = await Promise.all(people.map((p) => sessionOf(p.id)));
    await closeSession(sessions[1]!);
    const answers = await Promise.all([
      ...people.map((p, i) => loadUser({ id: p.id, sessionId: sessions[i]! })),
      // Someone else's session id with this person's id is not their session.
      loadUser({ id: people[0]!.id, sessionId: sessions[2]! }),
      loadUser({ id: people[2]!.id, sessionId: sessions[2]! }),
    ]);
    expect(answers.map((u) => u?.id ?? null)).toEqual([people[0]!.id, null, people[2]!.id, null, people[2]!.id]);
    expect(answers[0]).toEqual({
      id: people[0]!.id,
      email: people[0]!.email,
      name: people[0]!.name,
      role: 'customer',
      unitSystem: people[0]!.unitSystem,
      accountId: acct.id,
    });
  });

  it('a session id that is not even an id fails alone, not the reads beside it', async () => {
    const person = await makeUser('support');
    const sid = await sessionOf(person.id);
    const [bad, good] = await Promise.allSettled([
      loadUser({ id: person.id, sessionId: 'not-a-session' }),
      loadUser({ id: person.id, sessionId: sid }),
    ]);
    expect(bad.status).toBe('rejected');
    expect(good).toEqual({ status: 'fulfilled', value: expect.objectContaining({ id: person.id }) });
  });
});
