import { execFileSync } from 'node:child_process';
import path from 'node:path';

// Fault tests stop and start PostgreSQL, so they get a cluster of their own, never the shared test one.
const root = path.resolve(__dirname, '../../..');

export function clusterFor(name: string, port: number) {
  const env = { ...process.env, PG_DATA_DIR: path.join(root, '.data', `pg-fault-${name}`), PG_PORT: String(port) };
  const run = (...args: string[]) =>
    execFileSync('bash', [path.join(root, 'db/postgres.sh'), ...args], { env, stdio: 'pipe' }).toString();
  const url = `postgres://postgres@127.0.0.1:${port}/dutywise_fault`;
  return {
    url,
    start: () => run('start', '--throwaway', '--db', 'dutywise_fault'),
    stop: () => run('stop'),
    migrate: () =>
      execFileSync('npx', ['tsx', 'db/migrate.mts'], {
        cwd: root,
        env: { ...env, DATABASE_URL: url, MIGRATION_DATABASE_URL: url },
        stdio: 'pipe',
      }),
  };
}
