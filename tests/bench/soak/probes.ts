// What the soak watches besides answers: the app's resident memory and the database's connections.
import { readFileSync, readdirSync } from 'node:fs';
import { Client } from 'pg';

function childrenOf(pid: number): number[] {
  const out: number[] = [];
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      // Field 4 of /proc/<pid>/stat is the parent pid; the command name before it may hold spaces.
      const stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
      const ppid = Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
      if (ppid === pid) out.push(Number(entry));
    } catch {
      // the process ended while we looked
    }
  }
  return out;
}

/** Resident memory (MiB) of the app process and any processes it started. */
export function treeRssMiB(pid: number): number {
  let kib = 0;
  const queue = [pid];
  while (queue.length) {
    const p = queue.pop()!;
    try {
      const m = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${p}/status`, 'utf8'));
      kib += Number(m?.[1] ?? 0);
      queue.push(...childrenOf(p));
    } catch {
      // gone
    }
  }
  return kib / 1024;
}

export type Connections = { total: number; active: number; idle: number };

/** Connections to the app's database other than this probe's own. */
export async function databaseConnections(client: Client): Promise<Connections> {
  const { rows } = await client.query<{ state: string | null; n: string }>(
    `select state, count(*) as n from pg_stat_activity
     where datname = current_database() and pid <> pg_backend_pid() group by state`,
  );
  const by = (s: string) => Number(rows.find((r) => r.state === s)?.n ?? 0);
  return { total: rows.reduce((a, r) => a + Number(r.n), 0), active: by('active'), idle: by('idle') };
}
