import { execFile } from 'node:child_process';
import path from 'node:path';
import { Client } from 'pg';

// Databases of their own on the test cluster, and the project's npm scripts run as an operator would.
const root = path.resolve(__dirname, '../../..');
const clusterUrl = (name: string) => {
  // The cluster's owner: it creates databases; the app role may not.
  const u = new URL(
    process.env.MIGRATION_DATABASE_URL ??
      process.env.DATABASE_URL ??
      'postgres://postgres@127.0.0.1:55433/dutywise_test',
  );
  u.pathname = `/${name}`;
  return u.toString();
};

export type ScriptEnv = Record<string, string>;

async function admin(statement: string): Promise<void> {
  const c = new Client({ connectionString: clusterUrl('postgres') });
  await c.connect();
  try {
    await c.query(statement);
  } finally {
    await c.end();
  }
}

/** Creates an empty database (as `createdb` would) and answers its URL. */
export async function createDatabase(name: string): Promise<string> {
  await admin(`drop database if exists "${name}" with (force)`);
  await admin(`create database "${name}"`);
  return clusterUrl(name);
}

/** A copy of a database (no one may be connected to the original meanwhile); answers its URL. */
export async function cloneDatabase(fromUrl: string, name: string): Promise<string> {
  const from = new URL(fromUrl).pathname.slice(1);
  await admin(`drop database if exists "${name}" with (force)`);
  await admin(`create database "${name}" template "${from}"`);
  return clusterUrl(name);
}

export async function dropDatabase(name: string): Promise<void> {
  await admin(`drop database if exists "${name}" with (force)`);
}

/**
 * `npm run <script>` with the given settings; resolves to its output, rejects with its error output. Never
 * synchronous: a fake the script talks to (the S3 fake) runs in this process and must keep answering.
 */
export function runScript(args: string[], env: ScriptEnv): Promise<string> {
  return new Promise((resolve, reject) => {
    execFile(
      'npm',
      ['run', '--silent', ...args],
      {
        cwd: root,
        // The scripts run as the owner of the database they are given (as an operator runs them).
        env: {
          ...process.env,
          BLOB_STORE: 'postgres',
          LOG_LEVEL: 'warn',
          ...(env.DATABASE_URL ? { MIGRATION_DATABASE_URL: env.DATABASE_URL } : {}),
          ...env,
        },
        encoding: 'utf8',
      },
      (err, stdout, stderr) =>
        err ? reject(new Error(`npm run ${args[0]} exited with ${err.code}: ${stderr}${stdout}`)) : resolve(stdout),
    );
  });
}
