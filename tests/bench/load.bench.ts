// HTTP load on loopback only, bounded in time: the public calculate API and the support search on the
// production server, at 50 and 200 connections, beside a bare node:http server doing the same calculation.
import autocannon from 'autocannon';
import { recordResults, verdict } from './stats';

const app = process.env.BENCH_APP_URL ?? 'http://localhost:3200';
const bare = process.env.BENCH_BARE_URL ?? 'http://127.0.0.1:3299';
const seconds = Number(process.env.BENCH_LOAD_SECONDS ?? 30);
const body = JSON.stringify({
  service: 'heater',
  gas: { preset: 'air' },
  flow: { value: 2000, unit: 'kg/h' },
  inlet: { temperature: { value: 15, unit: 'degC' }, pressure: { value: 3, unit: 'barg' } },
  outletTemperature: { value: 320, unit: 'degC' },
  heatLossPercent: 5,
  designMarginPercent: 10,
});

type Row = [string, string, string, string];
type Run = { rps: number; p50: number; p99: number; errors: number; non2xx: number };

type HitOptions = { method?: 'GET' | 'POST'; body?: string; headers?: Record<string, string>; paths?: string[] };

async function hit(url: string, connections: number, opts: HitOptions): Promise<Run> {
  const requests = opts.paths?.map((path) => ({ method: 'GET' as const, path }));
  const r = await autocannon({
    url,
    connections,
    duration: seconds,
    method: opts.method ?? 'GET',
    body: opts.body,
    headers: { 'content-type': 'application/json', ...opts.headers },
    requests,
  });
  return {
    rps: r.requests.average,
    p50: r.latency.p50,
    p99: r.latency.p99,
    errors: r.errors + r.timeouts,
    non2xx: r.non2xx,
  };
}

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

// What support looks up: a partial tag, a customer, a sizing number, and a broad prefix matching
// thousands of sizings; each connection cycles through the four. Numbers and names come from the data.
async function searchPaths(cookie: string): Promise<string[]> {
  const res = await fetch(`${app}/api/v1/support/search?q=EH-4711`, { headers: { cookie } });
  const first = ((await res.json()) as { hits: { number: string; accountName: string }[] }).hits[0];
  if (!first) throw new Error('the benchmark database has no sizing tagged EH-4711; run generate-sizings first');
  return ['EH-4711', first.accountName, first.number, 'EH-47'].map(
    (q) => `/api/v1/support/search?q=${encodeURIComponent(q)}`,
  );
}

async function main() {
  const cookie = await supportCookie();
  const paths = await searchPaths(cookie);
  const rows: Row[] = [];
  for (const connections of [50, 200]) {
    const b = await hit(`${bare}/`, connections, { method: 'POST', body });
    const c = await hit(`${app}/api/v1/calculate`, connections, { method: 'POST', body });
    const s = await hit(app, connections, { headers: { cookie }, paths });
    // The framework's own floor: a route handler that only serialises a prepared document. What calculate
    // loses against it is ours; what it loses against the bare server is the framework's request pipeline.
    const floor = connections === 50 ? await hit(`${app}/api/v1/openapi`, connections, {}) : null;
    const ratio = c.rps / b.rps;
    rows.push(
      [
        `bare node:http calculate, ${connections} conn: req/s, p50/p99`,
        `${b.rps.toFixed(0)}, ${b.p50}/${b.p99} ms`,
        'yardstick',
        '—',
      ],
      [
        `Next calculate, ${connections} conn: req/s, p50/p99`,
        `${c.rps.toFixed(0)}, ${c.p50}/${c.p99} ms`,
        connections === 50 ? 'p99 < 50 ms' : '—',
        connections === 50 ? verdict(c.p99 < 50) : '—',
      ],
      [
        `Next calculate, ${connections} conn: errors, non-2xx`,
        `${c.errors}, ${c.non2xx}`,
        '0, 0',
        verdict(c.errors === 0 && c.non2xx === 0),
      ],
      [`Next / bare throughput, ${connections} conn`, ratio.toFixed(2), '≥ 0.50', verdict(ratio >= 0.5)],
      ...(floor
        ? [
            [
              `Next floor (GET /api/v1/openapi), ${connections} conn: req/s, p50/p99`,
              `${floor.rps.toFixed(0)}, ${floor.p50}/${floor.p99} ms`,
              'info',
              '—',
            ] as Row,
            [`Next floor / bare throughput, ${connections} conn`, (floor.rps / b.rps).toFixed(2), 'info', '—'] as Row,
          ]
        : []),
      [
        `support search (tag, customer, number, broad prefix), ${connections} conn: req/s, p50/p99`,
        `${s.rps.toFixed(0)}, ${s.p50}/${s.p99} ms`,
        '—',
        '—',
      ],
      [
        `support search, ${connections} conn: errors, non-2xx`,
        `${s.errors}, ${s.non2xx}`,
        '0, 0',
        verdict(s.errors === 0 && s.non2xx === 0),
      ],
    );
  }
  recordResults(`HTTP load (${seconds} s a run, loopback)`, rows);
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
