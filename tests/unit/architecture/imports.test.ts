import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import {
  buildImportGraph,
  findCycles,
  importsInto,
  listOffences,
  privateImports,
  privateOwner,
  type ImportGraph,
} from './import-graph';

// Layout rules the tree keeps (DEVELOPERS.md, "Layout"): no import cycles; a route's private folders
// (_components, _lib) are read only by that route and the routes under it; lib/ is below app/; and
// product code never reaches the local fakes in mocks/ (lint checks that too, file by file).
const root = join(dirname(fileURLToPath(import.meta.url)), '../../..');
const product = buildImportGraph(root, ['app', 'lib', 'middleware.ts']);
const isProduct = (f: string) => f.startsWith('app/') || f.startsWith('lib/') || f === 'middleware.ts';

describe('the product code', () => {
  it('is read: the graph holds the routes, the domain and the middleware', () => {
    expect(product.size).toBeGreaterThan(300);
    expect(product.get('app/(desk)/sizings/[sizingId]/page.tsx')).toContain(
      'app/_components/sizing-result/result-details.tsx',
    );
    expect(product.get('middleware.ts')).toContain('lib/auth/local/session-token.ts');
  });

  it('has no import cycle', () => {
    const cycles = findCycles(product);
    expect(cycles.map((c) => c.join(' -> ')).join('\n')).toBe('');
  });

  it("never imports another route's private folder", () => {
    expect(listOffences(privateImports(product))).toBe('');
  });

  it('keeps lib/ free of app/ imports', () => {
    expect(listOffences(importsInto(product, (f) => f.startsWith('lib/'), 'app/'))).toBe('');
  });

  it('never imports the local fakes', () => {
    expect(listOffences(importsInto(product, isProduct, 'mocks/'))).toBe('');
  });
});

describe('the checks themselves', () => {
  const scratch = mkdtempSync(join(tmpdir(), 'dutywise-imports-'));
  afterAll(() => rmSync(scratch, { recursive: true, force: true }));
  const write = (file: string, text: string) => {
    mkdirSync(dirname(join(scratch, file)), { recursive: true });
    writeFileSync(join(scratch, file), text);
  };

  it('finds a cycle through static, type-only and dynamic imports, and re-exports', () => {
    write('lib/a/one.ts', "import { two } from './two';\nexport const one = two;\n");
    write('lib/a/two.ts', "import type { T } from '@/lib/a/three';\nexport const two = 2;\nexport type U = T;\n");
    write('lib/a/three.ts', "export { one } from './one';\nexport type T = number;\n");
    write('lib/b/lazy.ts', "export const load = () => import('@/lib/b/back');\n");
    write('lib/b/back.ts', "import { load } from './lazy';\nexport const again = load;\n");
    write('lib/c/alone.ts', "import { z } from 'zod';\nexport const alone = z;\n");
    const graph = buildImportGraph(scratch, ['lib']);
    expect(findCycles(graph)).toEqual(
      expect.arrayContaining([
        ['lib/a/one.ts', 'lib/a/three.ts', 'lib/a/two.ts'],
        ['lib/b/back.ts', 'lib/b/lazy.ts'],
      ]),
    );
    expect(findCycles(graph)).toHaveLength(2);
    expect(graph.get('lib/c/alone.ts')).toEqual([]);
  });

  it('finds a file that imports itself, and no cycle in a chain', () => {
    const self: ImportGraph = new Map([['x.ts', ['x.ts']]]);
    expect(findCycles(self)).toEqual([['x.ts']]);
    const chain: ImportGraph = new Map(Array.from({ length: 5000 }, (_, i) => [`f${i}.ts`, i ? [`f${i - 1}.ts`] : []]));
    expect(findCycles(chain)).toEqual([]);
  });

  it("tells a route's own private imports from another route's", () => {
    expect(privateOwner('app/(desk)/size/_lib/steps.ts')).toBe('app/(desk)/size');
    expect(privateOwner('app/_components/logo.tsx')).toBe('app');
    expect(privateOwner('lib/thermo/index.ts')).toBeNull();
    const graph: ImportGraph = new Map([
      ['app/(desk)/size/page.tsx', ['app/(desk)/size/_components/desk.tsx', 'app/_components/logo.tsx']],
      ['app/(desk)/quotes/[id]/page.tsx', ['app/(desk)/quotes/_components/table.tsx']],
      ['app/(desk)/sizings/page.tsx', ['app/(desk)/size/_lib/steps.ts']],
      ['lib/x/y.ts', ['app/_components/logo.tsx']],
    ]);
    expect(privateImports(graph)).toEqual([
      { file: 'app/(desk)/sizings/page.tsx', imports: 'app/(desk)/size/_lib/steps.ts' },
      { file: 'lib/x/y.ts', imports: 'app/_components/logo.tsx' },
    ]);
  });

  it('reports imports into a folder by file', () => {
    const graph: ImportGraph = new Map([
      ['lib/a.ts', ['mocks/smtp/server.ts', 'lib/b.ts']],
      ['tests/t.ts', ['mocks/smtp/server.ts']],
    ]);
    expect(listOffences(importsInto(graph, isProduct, 'mocks/'))).toBe('lib/a.ts -> mocks/smtp/server.ts');
  });
});
