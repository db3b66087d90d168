// One autocannon run and what the server process spent on it, for the HTTP load benchmark.
import autocannon from 'autocannon';
import { readFileSync } from 'node:fs';

const seconds = Number(process.env.BENCH_LOAD_SECONDS ?? 30);
// Long enough that a request queued behind 200 others is answered, not abandoned by the client.
export const CLIENT_TIMEOUT_S = 60;

export type Run = {
  rps: number;
  p50: number;
  p99: number;
  errors: number;
  timeouts: number;
  non2xx: number;
  requests: number;
  /** CPU time the server process used during the run, when its pid is known (Linux /proc). */
  serverCpuMs: number | null;
};

type HitOptions = { method?: 'GET' | 'POST'; body?: string; headers?: Record<string, string>; paths?: string[] };

/** User plus system CPU of a process so far, in ms; null where /proc is not available. */
function cpuMs(pid: number): number | null {
  if (!pid) return null;
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
    // utime and stime, in clock ticks of 10 ms on Linux
    return (Number(fields[11]) + Number(fields[12])) * 10;
  } catch {
    return null;
  }
}

export async function hit(url: string, connections: number, opts: HitOptions, serverPid = 0): Promise<Run> {
  const requests = opts.paths?.map((path) => ({ method: 'GET' as const, path }));
  const before = cpuMs(serverPid);
  const r = await autocannon({
    url,
    connections,
    duration: seconds,
    timeout: CLIENT_TIMEOUT_S,
    method: opts.method ?? 'GET',
    body: opts.body,
    headers: { 'content-type': 'application/json', ...opts.headers },
    requests,
  });
  const after = cpuMs(serverPid);
  return {
    rps: r.requests.average,
    p50: r.latency.p50,
    p99: r.latency.p99,
    errors: r.errors - r.timeouts,
    timeouts: r.timeouts,
    non2xx: r.non2xx,
    requests: r.requests.total,
    serverCpuMs: before !== null && after !== null ? after - before : null,
  };
}

/** The server's CPU per answered request: steadier than throughput on a machine shared with other work. */
export function serverCpuMs(r: Run): string {
  return r.serverCpuMs === null || !r.requests ? 'n/a' : (r.serverCpuMs / r.requests).toFixed(2);
}
