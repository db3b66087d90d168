import { execFileSync } from 'node:child_process';
import path from 'node:path';

// Browser journeys start from the invented demo scenario, seeded fresh into the test database.
export default function globalSetup() {
  execFileSync('npx', ['tsx', '--require', './db/script-preload.cjs', 'db/seed.ts', '--reset'], {
    cwd: path.join(__dirname, '..', '..'),
    stdio: 'inherit',
    env: { ...process.env, DATABASE_URL: process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55433/dutywise_test' },
  });
}
