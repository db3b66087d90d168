import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const root = fileURLToPath(new URL('..', import.meta.url));

// Unit tests are pure; integration tests talk to the PostgreSQL that tests/run.sh starts.
export default defineConfig({
  root,
  // Templates and PDF documents are .tsx; tsconfig keeps JSX for Next, so tests transform it here.
  oxc: { jsx: { runtime: 'automatic', importSource: 'react' } },
  resolve: { alias: { '@': root.replace(/\/$/, '') } },
  test: {
    include: ['tests/unit/**/*.test.ts', 'tests/integration/**/*.test.ts'],
    environment: 'node',
    setupFiles: ['tests/setup/server-only.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    fileParallelism: true,
    pool: 'forks',
  },
});
