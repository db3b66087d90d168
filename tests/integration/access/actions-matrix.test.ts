import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { UserRole } from '@/db/schema/enums';
import { actAs } from '../helpers/session';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { actionTable } from './action-table';

const root = path.resolve(__dirname, '../../..');

function findActionFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return findActionFiles(full);
    return name === 'actions.ts' ? [path.relative(root, full)] : [];
  });
}

type Action = (input: unknown) => Promise<unknown>;
const modules = new Map<string, Record<string, unknown>>();
const roles: UserRole[] = ['sales_engineer', 'customer', 'support', 'admin'];
const people = new Map<UserRole, { id: string; role: string }>();

beforeAll(async () => {
  for (const file of findActionFiles(path.join(root, 'app')))
    modules.set(file, (await import(path.join(root, file))) as Record<string, unknown>);
  const acct = await makeAccount('Matrix');
  for (const r of roles) people.set(r, await makeUser(r, r === 'customer' ? acct.id : undefined));
});

describe('server action access matrix', () => {
  it('every exported action has a row in the table, and every row names a real export', () => {
    const found = [...modules].flatMap(([file, mod]) =>
      Object.entries(mod)
        .filter(([, v]) => typeof v === 'function')
        .map(([name]) => `${file}#${name}`),
    );
    expect(found.sort()).toEqual(Object.keys(actionTable).sort());
  });

  it('each role is allowed or refused exactly as the table says (signed-out included)', async () => {
    const failures: string[] = [];
    for (const [key, access] of Object.entries(actionTable)) {
      if (access.skip) continue;
      const [file, name] = key.split('#') as [string, string];
      const action = modules.get(file)?.[name] as Action | undefined;
      if (!action) continue;
      for (const who of [null, ...roles] as const) {
        await actAs(who ? people.get(who)! : null);
        // An empty payload: an allowed caller gets a validation answer, a refused one an identity or role answer.
        const res = (await action({})) as { ok: boolean; status?: number };
        const allowed = access.allowed === 'public' || (who !== null && access.allowed.includes(who));
        const expected = allowed ? [400, 409, 410, 422] : [who === null ? 401 : 403];
        if (res.ok || !expected.includes(res.status ?? 0))
          failures.push(
            `${key} as ${who ?? 'signed-out'}: got ${res.ok ? 'ok' : res.status}, expected ${expected.join('/')}`,
          );
      }
    }
    expect(failures).toEqual([]);
  });
});
