import { spawn } from 'node:child_process';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { blobs, quotes, sizings, uploads } from '@/db/schema';
import { makeAccount, makeUser } from '../helpers/fixtures';

const root = path.resolve(__dirname, '../../..');

async function transactionOpen(appName: string): Promise<boolean> {
  const res = await db.execute<{ n: number }>(
    // a statement in the child's transaction is running or it sits inside one
    (await import('drizzle-orm'))
      .sql`select count(*)::int as n from pg_stat_activity where application_name = ${appName} and xact_start is not null`,
  );
  return (res.rows[0]?.n ?? 0) > 0;
}

describe('the app process killed during a write', () => {
  it('a batch save killed inside its transaction leaves no sizing, quote, upload or blob', async () => {
    const acct = await makeAccount('Killed');
    const engineer = await makeUser('sales_engineer');
    const appName = `kill-${acct.id.slice(0, 8)}`;
    const url = new URL(process.env.DATABASE_URL!);
    url.searchParams.set('application_name', appName);
    const child = spawn(
      'node',
      [
        '--require',
        './db/script-preload.cjs',
        '--import',
        'tsx',
        'tests/integration/faults/kill-child.ts',
        acct.id,
        engineer.id,
        '4000',
      ],
      {
        cwd: root,
        env: { ...process.env, DATABASE_URL: url.toString(), LOG_LEVEL: 'fatal' },
        stdio: 'pipe',
      },
    );
    let output = '';
    child.stdout.on('data', (d) => (output += d));
    let open = false;
    // The child compiles and loads the app first, which takes seconds when the suite runs its files in parallel.
    for (let i = 0; i < 2000 && !open; i++) {
      open = await transactionOpen(appName);
      if (!open) await new Promise((r) => setTimeout(r, 10));
    }
    expect(open, 'the child reached its transaction').toBe(true);
    child.kill('SIGKILL');
    await new Promise((r) => child.on('exit', r));
    expect(output).not.toMatch(/finished/);
    // PostgreSQL rolls back the dead session's transaction.
    for (let i = 0; i < 100 && (await transactionOpen(appName)); i++) await new Promise((r) => setTimeout(r, 50));
    expect(await db.select().from(sizings).where(eq(sizings.accountId, acct.id))).toHaveLength(0);
    expect(await db.select().from(quotes).where(eq(quotes.accountId, acct.id))).toHaveLength(0);
    expect(await db.select().from(uploads).where(eq(uploads.accountId, acct.id))).toHaveLength(0);
    expect(await db.select().from(blobs).where(eq(blobs.accountId, acct.id))).toHaveLength(0);
  }, 60_000);
});
