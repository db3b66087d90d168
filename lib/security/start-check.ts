import 'server-only';
import { sql } from 'drizzle-orm';
import { db } from '@/db';
import { clerkEnabled, env } from '@/lib/env';
import { logger } from '@/lib/log/logger';
import { peerHeaderTrusted } from './client-address';
import { buildProblems, isProductionStart, productionProblems } from './production-check';

/** Problems with the database role the app connects as: it must own no schema or table, and not be a superuser. */
async function roleProblems(): Promise<string[]> {
  try {
    const res = await db.execute<{ role: string; superuser: boolean; schemas: number; tables: number }>(sql`
      select r.rolname as role, r.rolsuper as superuser,
        (select count(*)::int from pg_namespace n where n.nspowner = r.oid) as schemas,
        (select count(*)::int from pg_class c where c.relowner = r.oid and c.relnamespace = 'public'::regnamespace) as tables
      from pg_roles r where r.rolname = current_user`);
    const row = res.rows[0];
    if (!row) return [];
    if (row.superuser || row.schemas > 0 || row.tables > 0)
      return [
        `DATABASE_URL signs in as '${row.role}', which ${row.superuser ? 'is a superuser' : 'owns schemas or tables'}: connect as dutywise_app (migrations run as the owner through MIGRATION_DATABASE_URL).`,
      ];
    return [];
  } catch (err) {
    // An unreachable database is answered with a 503 page, not a refusal to start; the role is checked next start.
    logger.warn({ err: (err as Error).message }, 'could not check the database role at start');
    return [];
  }
}

/** Refuses to go on, one clear line per problem, when a production start still has development settings. */
export async function refuseUnsafeStart(opts: { server: boolean }): Promise<void> {
  // The web server's code is built by Next, which fixes DUTYWISE_CLERK_BUILD (next.config.ts); the job worker
  // shows no pages and is not built, so the question does not arise there.
  // eslint-disable-next-line no-restricted-properties -- a literal in the built server
  const clerkInBuild = !opts.server || process.env.DUTYWISE_CLERK_BUILD === 'on';
  const problems = [
    ...buildProblems({ clerk: clerkEnabled, clerkInBuild }),
    ...productionProblems(env, { clerk: clerkEnabled, server: opts.server, peerHeader: peerHeaderTrusted() }),
  ];
  if (isProductionStart(env) && !env.DEMO_MODE) problems.push(...(await roleProblems()));
  if (!problems.length) return;
  for (const line of problems) console.error(`Dutywise refuses to start: ${line}`);
  process.exit(1);
}
