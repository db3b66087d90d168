import { spawn, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outbox } from '@/db/schema';
import { datasheetProps, startMailRig, type MailRig } from './mail-rig';

// Two real worker processes, as two app instances would run them, against one database and one SMTP server
// (and this file's own pg-boss schema).
const root = fileURLToPath(new URL('../../..', import.meta.url));
let rig: MailRig;
const workers: { child: ChildProcess; output: string[]; exit: Promise<number | null> }[] = [];

function startWorker() {
  const child = spawn(
    process.execPath,
    [
      '--require',
      './db/script-preload.cjs',
      '--import',
      'tsx',
      'lib/jobs/worker.mts',
      '--interval-ms',
      '500',
      '--concurrency',
      '4',
    ],
    {
      cwd: root,
      env: { ...process.env, SMTP_PORT: String(rig.fake.smtpPort), JOBS_SCHEMA: rig.schema, LOG_LEVEL: 'debug' },
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  );
  const output: string[] = [];
  child.stdout?.on('data', (d: Buffer) => output.push(d.toString()));
  child.stderr?.on('data', (d: Buffer) => output.push(d.toString()));
  const exit = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  workers.push({ child, output, exit });
  return { child, output, exit };
}

async function until(what: string, check: () => boolean | Promise<boolean>, boundMs = 60_000) {
  const deadline = Date.now() + boundMs;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error(`gave up waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

beforeAll(async () => {
  rig = await startMailRig();
});
afterAll(async () => {
  for (const w of workers) if (w.child.exitCode === null) w.child.kill('SIGKILL');
  await rig.close();
});

describe('job worker processes', () => {
  it('two workers deliver 50 messages exactly once between them and stop cleanly on SIGTERM', async () => {
    const a = startWorker();
    const b = startWorker();
    await until('both workers to start', () => [a, b].every((w) => w.output.join('').includes('job worker started')));

    const addresses = Array.from({ length: 50 }, (_, i) => rig.address(`proc${i}`));
    await rig.db.transaction(async (tx) => {
      for (const [i, to] of addresses.entries())
        await rig.enqueueEmail(tx, { template: 'datasheet-issued', to, props: datasheetProps(`DS-PROC-${i}`) });
    });
    await until('all 50 to be recorded as sent', async () => {
      const rows = await rig.db
        .select({ status: outbox.status })
        .from(outbox)
        .where(inArray(outbox.toAddress, addresses));
      return rows.length === 50 && rows.every((r) => r.status === 'sent');
    });

    a.child.kill('SIGTERM');
    b.child.kill('SIGTERM');
    expect(await a.exit).toBe(0);
    expect(await b.exit).toBe(0);
    for (const w of [a, b]) expect(w.output.join('')).toContain('job worker stopped');

    const rows = await rig.db.select({ id: outbox.id }).from(outbox).where(inArray(outbox.toAddress, addresses));
    const ids = rig.received().map((m) => m.messageId);
    expect(ids).toHaveLength(50);
    expect([...new Set(ids)].sort()).toEqual(rows.map((r) => `<${r.id}@dutywise>`).sort());
  }, 120_000);
});
