// HTTP load on loopback only, bounded in time: the public calculate API beside the framework's floor (a
// minimal Next app with one route handler, built and started by run.sh in the same run), and the support
// look-up's realistic mix, at 50 and 200 connections. The client waits up to CLIENT_TIMEOUT_S and the servers
// keep idle connections open (next start --keepAliveTimeout), so a queue is answered, not dropped.
import { db, pool } from '@/db';
import type { CurrentUser } from '@/lib/auth/current-user';
import { supportSearchSchema } from '@/lib/support/schema';
import { searchSizings } from '@/lib/support/search';
import { hit, serverCpuMs, type Run } from './load-run';
import { lookupCases, queryToTime } from './search-cases';
import { recordResults, verdict } from './stats';

const app = process.env.BENCH_APP_URL ?? 'http://127.0.0.1:3200';
const floorUrl = process.env.BENCH_FLOOR_URL ?? 'http://127.0.0.1:3300';
const [appPid, floorPid] = [Number(process.env.BENCH_APP_PID), Number(process.env.BENCH_FLOOR_PID)];
const body = JSON.stringify({
  service: 'heater',
  gas: { preset: 'air' },
  flow: { value: 2000, unit: 'kg/h' },
  inlet: { temperature: { value: 15, unit: 'degC' }, pressure: { value: 3, unit: 'barg' } },
  outletTemperature: { value: 320, unit: 'degC' },
  heatLossPercent: 5,
  designMarginPercent: 10,
});
const staff: CurrentUser = {
  id: '00000000-0000-0000-0000-000000000001',
  email: 'bench@bench.example',
  name: 'Bench',
  role: 'support',
  accountId: null,
  unitSystem: 'si',
};

type Row = [string, string, string, string];

async function supportCookie(): Promise<string> {
  const res = await fetch(`${app}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'priya.caldwell@halvard.example', password: 'dutywise-demo' }),
  });
  const cookie = res.headers.get('set-cookie')?.split(';')[0];
  if (!res.ok || !cookie) throw new Error(`could not sign in for the search load (HTTP ${res.status})`);
  return cookie;
}

/** Every look-up kind the latency benchmark times, as the screen would ask for it. */
async function searchPaths(): Promise<string[]> {
  const paths: string[] = [];
  for (const c of await lookupCases(db)) {
    const q = await queryToTime(c, (x) => searchSizings(staff, supportSearchSchema.parse(x)));
    paths.push(`/api/v1/support/search?${new URLSearchParams(Object.entries(q).map(([k, v]) => [k, String(v)]))}`);
  }
  return paths;
}

const figures = (r: Run) => `${r.rps.toFixed(0)} req/s, p50 ${r.p50} / p99 ${r.p99} ms`;
const failures = (r: Run) => `${r.errors} errors, ${r.timeouts} time-outs, ${r.non2xx} non-2xx`;
const clean = (r: Run) => r.errors + r.timeouts + r.non2xx === 0;

async function main() {
  const cookie = await supportCookie();
  const paths = await searchPaths();
  const rows: Row[] = [];
  for (const connections of [50, 200]) {
    const floor = await hit(`${floorUrl}/api/floor`, connections, { method: 'POST', body }, floorPid);
    const calc = await hit(`${app}/api/v1/calculate`, connections, { method: 'POST', body }, appPid);
    const ratio = calc.rps / floor.rps;
    rows.push(
      [`minimal Next route handler (floor), ${connections} conn`, figures(floor), 'yardstick', '—'],
      [`calculate, ${connections} conn`, figures(calc), 'p99 reported', '—'],
      [`calculate, ${connections} conn: failures`, failures(calc), '0', verdict(clean(calc))],
      [`calculate / floor throughput, ${connections} conn`, ratio.toFixed(2), '≥ 0.80', verdict(ratio >= 0.8)],
      [
        `server CPU per request, floor / calculate, ${connections} conn`,
        `${serverCpuMs(floor)} / ${serverCpuMs(calc)} ms`,
        'info',
        '—',
      ],
    );
    const search = await hit(app, connections, { headers: { cookie }, paths }, appPid);
    const target = connections === 50;
    rows.push(
      [
        `support look-up mix (${paths.length} kinds), ${connections} conn`,
        figures(search),
        target ? 'p99 < 500 ms' : 'info',
        target ? verdict(search.p99 < 500) : '—',
      ],
      [`support look-up mix, ${connections} conn: failures`, failures(search), '0', verdict(clean(search))],
    );
  }
  recordResults(`HTTP load (${process.env.BENCH_LOAD_SECONDS ?? 30} s a run, loopback)`, rows);
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
