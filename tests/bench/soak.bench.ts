// The soak run: a bounded mixed office load on the production server (loopback only, stops itself after
// SOAK_SECONDS, 600 by default). Reports errors (goal 0), p95 per action, and the app's memory and the
// database's connections at start and end (goal flat).
import { Client } from 'pg';
import { openOffice } from './soak/office';
import { databaseConnections, treeRssMiB, type Connections } from './soak/probes';
import { officeActors, type Actor } from './soak/workload';
import { percentile, replaceResults, verdict } from './stats';

const base = process.env.BENCH_APP_URL ?? 'http://localhost:3201';
const seconds = Number(process.env.SOAK_SECONDS ?? 600);
const appPid = Number(process.env.BENCH_APP_PID ?? 0);
const distDir = process.env.NEXT_DIST_DIR ?? '.next-bench';
const poolCeiling = Number(process.env.DATABASE_POOL_MAX ?? 10) + 1; // the pool plus the middleware's ping

type Tally = { ms: number[]; errors: number; firstError?: string };
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

function assertLoopback(url: string) {
  const host = new URL(url).hostname;
  if (!['localhost', '127.0.0.1', '[::1]'].includes(host))
    throw new Error(`the soak run only drives a server on this machine (got ${host})`);
  if (!(seconds >= 10 && seconds <= 3600)) throw new Error(`SOAK_SECONDS must be 10 to 3600 (got ${seconds})`);
}

/** Runs one actor until the deadline, starting at a random phase and keeping to its rhythm with ±20 % jitter. */
async function loop(actor: Actor, deadline: number, tally: Tally): Promise<void> {
  await sleep(Math.random() * actor.everyS * 1000);
  while (Date.now() < deadline) {
    const started = performance.now();
    try {
      await actor.run();
      tally.ms.push(performance.now() - started);
    } catch (err) {
      tally.errors += 1;
      tally.firstError ??= (err as Error).message.slice(0, 160);
    }
    const wait = actor.everyS * 1000 * (0.8 + Math.random() * 0.4) - (performance.now() - started);
    await sleep(Math.max(0, Math.min(wait, deadline - Date.now())));
  }
}

async function main() {
  assertLoopback(base);
  const client = new Client({ connectionString: process.env.DATABASE_URL });
  await client.connect();
  const office = await openOffice(base, distDir, client);
  const actors = officeActors(office);
  // Warm-up: every action once, so first-use costs (code loading, font parsing) are not counted as drift.
  for (const a of actors) await a.run().catch((err: Error) => console.warn(`warm-up ${a.name}: ${err.message}`));
  await sleep(2_000);

  const sample = async () => ({ rss: appPid ? treeRssMiB(appPid) : NaN, conns: await databaseConnections(client) });
  const start = await sample();
  const samples = [start];
  const deadline = Date.now() + seconds * 1000;
  const tallies = new Map<string, Tally>();
  const probe = setInterval(() => void sample().then((s) => samples.push(s)), 15_000);
  console.log(`soak: ${actors.length} actors for ${seconds} s against ${base}`);
  await Promise.all(
    actors.map((a) => {
      const t = tallies.get(a.name) ?? { ms: [], errors: 0 };
      tallies.set(a.name, t);
      return loop(a, deadline, t);
    }),
  );
  clearInterval(probe);
  await sleep(1_000);
  const end = await sample();
  samples.push(end);
  await client.end();
  report(tallies, start, end, samples);
}

type Sample = { rss: number; conns: Connections };

function report(tallies: Map<string, Tally>, start: Sample, end: Sample, samples: Sample[]) {
  const rows: [string, string, string, string][] = [];
  let errors = 0;
  let total = 0;
  for (const [name, t] of tallies) {
    errors += t.errors;
    total += t.ms.length + t.errors;
    rows.push([
      `${name}: done, errors, p50 / p95`,
      `${t.ms.length}, ${t.errors}, ${percentile(t.ms, 50).toFixed(0)} / ${percentile(t.ms, 95).toFixed(0)} ms`,
      '0 errors',
      verdict(t.errors === 0),
    ]);
    if (t.firstError) console.warn(`  first ${name} error: ${t.firstError}`);
  }
  rows.unshift([`requests (actions), errors`, `${total}, ${errors}`, '0 errors', verdict(errors === 0)]);
  const peakRss = Math.max(...samples.map((s) => s.rss));
  const growth = (end.rss - start.rss) / start.rss;
  rows.push(
    [
      'app memory (RSS) start / end / peak',
      `${start.rss.toFixed(0)} / ${end.rss.toFixed(0)} / ${peakRss.toFixed(0)} MiB`,
      'end within 10 % of start',
      Number.isFinite(growth) ? verdict(growth <= 0.1) : '—',
    ],
    [
      'database connections start / end / peak (active at end)',
      `${start.conns.total} / ${end.conns.total} / ${Math.max(...samples.map((s) => s.conns.total))} (${end.conns.active})`,
      `≤ ${poolCeiling} (pool + ping)`,
      verdict(end.conns.total <= poolCeiling),
    ],
  );
  replaceResults(`Soak (${(seconds / 60).toFixed(seconds % 60 ? 1 : 0)} min mixed office load, loopback)`, rows);
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
