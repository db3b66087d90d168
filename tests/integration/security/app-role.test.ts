import { sql } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';

// The suite connects as the app's role (DATABASE_URL), as the app does; migrations ran as the schema's owner.
describe('the app connects as a role that owns nothing', () => {
  it('is not a superuser and owns no schema or table', async () => {
    const res = await db.execute<{ role: string; superuser: boolean; schemas: number; tables: number }>(sql`
      select current_user as role, r.rolsuper as superuser,
        (select count(*)::int from pg_namespace n where n.nspowner = r.oid) as schemas,
        (select count(*)::int from pg_class c where c.relowner = r.oid) as tables
      from pg_roles r where r.rolname = current_user`);
    expect(res.rows[0]).toEqual({ role: 'dutywise_app', superuser: false, schemas: 0, tables: 0 });
  });

  it.each([
    ['drop the revision-immutability trigger', 'drop trigger datasheet_revisions_immutable on datasheet_revisions'],
    ['disable it', 'alter table datasheet_revisions disable trigger datasheet_revisions_immutable'],
    [
      'replace its function',
      "create or replace function dutywise_refuse_change() returns trigger as 'begin return new; end' language plpgsql",
    ],
    ['change an issued revision', "update datasheet_revisions set note = 'changed'"],
    ['delete an issued revision', 'delete from datasheet_revisions'],
    ['truncate a table', 'truncate audit_log'],
    ['create a table', 'create table public.intruder (id int)'],
  ])('cannot %s', async (_what, statement) => {
    // Drizzle wraps the server's refusal; its cause is PostgreSQL's own message.
    await expect(db.execute(sql.raw(statement))).rejects.toMatchObject({
      cause: { message: expect.stringMatching(/must be owner|permission denied/) },
    });
  });
});
