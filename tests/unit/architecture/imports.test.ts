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
  runtimeGraph,
  type ImportGraph,
  type RuntimeGraph,
} from './import-graph';

// Layout rules the tree keeps (DEVELOPERS.md, "Layout"): no import cycle among the modules loaded at run time
// (type-only imports are erased by the compiler, so data files may import their table's type); a route's
// private folders (_components, _lib) are read only by that route and the routes under it; lib/ is below app/;
// and product code never reaches the local fakes in mocks/ (lint checks that too, file by file).
const root = join(dirname(fileURLToPath(import.meta.url)), '../../..');
const product = buildImportGraph(root, ['app', 'lib', 'middleware.ts']);
const isProduct = (f: string) => f.startsWith('app/') || f.startsWith('lib/') || f === 'middleware.ts';

describe('the product code', () => {
  it('is read: the graph holds the routes, the domain and the middleware', () => {
    expect(product.size).toBeGreaterThan(300);
    expect(product.get('app/(desk)/sizings/[sizingId]/page.tsx')).toContainEqual({
      to: 'app/_components/sizing-result/result-details.tsx',
      typeOnly: false,
    });
    expect(product.get('middleware.ts')).toContainEqual({ to: 'lib/auth/local/session-token.ts', typeOnly: false });
  });

  it('has no import cycle', () => {
    const cycles = findCycles(runtimeGraph(product));
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

// A graph of type-only edges: the layout rules hold for those too.
const edges = (from: Record<string, string[]>): ImportGraph =>
  new Map(Object.entries(from).map(([file, to]) => [file, to.map((t) => ({ to: t, typeOnly: true }))]));

describe('the checks themselves', () => {
  const scratch = mkdtempSync(join(tmpdir(), 'dutywise-imports-'));
  afterAll(() => rmSync(scratch, { recursive: true, force: true }));
  const write = (file: string, text: string) => {
    mkdirSync(dirname(join(scratch, file)), { recursive: true });
    writeFileSync(join(scratch, file), text);
  };

  it('finds a cycle through static and dynamic imports and re-exports, and none through type-only imports', () => {
    write('lib/a/one.ts', "import { two } from './two';\nexport const one = two;\n");
    write('lib/a/two.ts', "import { three } from '@/lib/a/three';\nexport const two = three;\n");
    write('lib/a/three.ts', "export { one } from './one';\nexport const three = 3;\n");
    write('lib/b/lazy.ts', "export const load = () => import('@/lib/b/back');\n");
    write('lib/b/back.ts', "import { load } from './lazy';\nexport const again = load;\n");
    write('lib/c/table.ts', "import { ROWS } from './rows';\nexport type Row = number;\nexport const table = ROWS;\n");
    write('lib/c/rows.ts', "import type { Row } from './table';\nexport const ROWS: Row[] = [];\n");
    write('lib/c/more.ts', "import { type Row } from './table';\nexport type { Row } from './table';\n");
    write('lib/c/alone.ts', "import { z } from 'zod';\nexport const alone = z;\n");
    const graph = buildImportGraph(scratch, ['lib']);
    expect(graph.get('lib/c/rows.ts')).toEqual([{ to: 'lib/c/table.ts', typeOnly: true }]);
    expect(graph.get('lib/c/more.ts')).toEqual([{ to: 'lib/c/table.ts', typeOnly: true }]);
    expect(graph.get('lib/c/alone.ts')).toEqual([]);
    const cycles = findCycles(runtimeGraph(graph));
    expect(cycles).toEqual(
      expect.arrayContaining([
        ['lib/a/one.ts', 'lib/a/three.ts', 'lib/a/two.ts'],
        ['lib/b/back.ts', 'lib/b/lazy.ts'],
      ]),
    );
    expect(cycles).toHaveLength(2);
  });

  it('finds a file that imports itself, and no cycle in a chain', () => {
    const self: RuntimeGraph = new Map([['x.ts', ['x.ts']]]);
    expect(findCycles(self)).toEqual([['x.ts']]);
    const chain: RuntimeGraph = new Map(
      Array.from({ length: 5000 }, (_, i) => [`f${i}.ts`, i ? [`f${i - 1}.ts`] : []]),
    );
    expect(findCycles(chain)).toEqual([]);
  });

  it("tells a route's own private imports from another route's", () => {
    expect(privateOwner('app/(desk)/size/_lib/steps.ts')).toBe('app/(desk)/size');
    expect(privateOwner('app/_components/logo.tsx')).toBe('app');
    expect(privateOwner('lib/thermo/index.ts')).toBeNull();
    const graph = edges({
      'app/(desk)/size/page.tsx': ['app/(desk)/size/_components/desk.tsx', 'app/_components/logo.tsx'],
      'app/(desk)/quotes/[id]/page.tsx': ['app/(desk)/quotes/_components/table.tsx'],
      'app/(desk)/sizings/page.tsx': ['app/(desk)/size/_lib/steps.ts'],
      'lib/x/y.ts': ['app/_components/logo.tsx'],
    });
    expect(privateImports(graph)).toEqual([
      { file: 'app/(desk)/sizings/page.tsx', imports: 'app/(desk)/size/_lib/steps.ts' },
      { file: 'lib/x/y.ts', imports: 'app/_components/logo.tsx' },
    ]);
  });

  it('reports imports into a folder by file', () => {
    const graph = edges({ 'lib/a.ts': ['mocks/smtp/server.ts', 'lib/b.ts'], 'tests/t.ts': ['mocks/smtp/server.ts'] });
    expect(listOffences(importsInto(graph, isProduct, 'mocks/'))).toBe('lib/a.ts -> mocks/smtp/server.ts');
  });
});
