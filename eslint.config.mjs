import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { FlatCompat } from '@eslint/eslintrc';
import prettier from 'eslint-config-prettier';

const compat = new FlatCompat({ baseDirectory: dirname(fileURLToPath(import.meta.url)) });

const config = [
  {
    ignores: [
      '.next/**',
      'tests/bench/floor-app/.next/**',
      '.next-*/**',
      '.scratch/**',
      'node_modules/**',
      '.data/**',
      'db/migrations/**',
      'next-env.d.ts',
      'tests/e2e/.results/**',
    ],
  },
  ...compat.extends('next/core-web-vitals', 'next/typescript'),
  {
    rules: {
      // Every exit from a module goes through lib/env.ts so configuration is validated once.
      'no-restricted-properties': [
        'error',
        { object: 'process', property: 'env', message: 'Read configuration from lib/env.ts.' },
      ],
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-definitions': ['error', 'type'],
      'no-console': ['error', { allow: ['warn', 'error'] }],
      // The local fakes stand in for hosted services in the demo and tests; product code never depends on them.
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@/mocks/*', '**/mocks/**'],
              message: 'mocks/ holds the local fakes: only tests/, db/ scripts and mocks/ itself may import them.',
            },
          ],
        },
      ],
    },
  },
  {
    // A CommonJS preload for Node scripts: require is the only way it can be written.
    files: ['**/*.cjs'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  // Layout is Prettier's job (npm run format); lint keeps to correctness.
  prettier,
  {
    // Scripts, fakes and tests run outside Next and read their own process environment.
    files: [
      'lib/env.ts',
      'db/**',
      'mocks/**',
      'tests/**',
      'drizzle.config.ts',
      'next.config.ts',
      'lib/server/serve.mjs',
    ],
    rules: { 'no-restricted-properties': 'off', 'no-console': 'off' },
  },
  {
    // Tests, database scripts and the fakes themselves start and drive the fakes.
    files: ['tests/**', 'db/**', 'mocks/**'],
    rules: { 'no-restricted-imports': 'off' },
  },
];

export default config;
