// Finding and running PostgreSQL's own dump tools for backups and restores.
import { execFileSync, spawn } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';

/** The newest installed copy of a PostgreSQL client tool (Debian keeps each major version apart), else PATH. */
export function pgTool(name: 'pg_dump' | 'pg_restore' | 'psql'): string {
  const root = '/usr/lib/postgresql';
  if (existsSync(root)) {
    const versions = readdirSync(root)
      .filter((v) => /^\d+$/.test(v))
      .sort((a, b) => Number(b) - Number(a));
    for (const v of versions) if (existsSync(`${root}/${v}/bin/${name}`)) return `${root}/${v}/bin/${name}`;
  }
  return name;
}

/**
 * The connection as libpq environment variables, so no password ever appears on a command line (and so in
 * the process list); `sslmode` and the other query parameters of the URL carry over.
 */
export function libpqEnv(databaseUrl: string): NodeJS.ProcessEnv {
  const u = new URL(databaseUrl);
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    PGHOST: decodeURIComponent(u.hostname),
    PGPORT: u.port || '5432',
    PGUSER: decodeURIComponent(u.username || 'postgres'),
    PGDATABASE: decodeURIComponent(u.pathname.slice(1)),
  };
  if (u.password) env.PGPASSWORD = decodeURIComponent(u.password);
  const sslmode = u.searchParams.get('sslmode');
  if (sslmode) env.PGSSLMODE = sslmode;
  return env;
}

/** The URL without its password, for logs and the manifest. */
export function redactUrl(databaseUrl: string): string {
  const u = new URL(databaseUrl);
  u.password = '';
  return u.toString();
}

/** Runs a tool to completion; rejects with its own error output when it fails. */
export function runTool(tool: string, args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(tool, args, { env, stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (c: Buffer) => (stderr = (stderr + c.toString()).slice(-4000)));
    child.on('error', reject);
    child.on('close', (code) =>
      code === 0 ? resolve() : reject(new Error(`${tool} exited with ${code}: ${stderr.trim()}`)),
    );
  });
}

/** `pg_dump --version`, recorded in the manifest. */
export function toolVersion(tool: string): string {
  return execFileSync(tool, ['--version']).toString().trim();
}
