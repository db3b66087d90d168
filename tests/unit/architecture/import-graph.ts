import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, normalize } from 'node:path';
import ts from 'typescript';

// The import graph of the product code, read with the TypeScript parser so every form counts: static and
// dynamic imports, re-exports (`export ... from`) and type-only imports, which are marked as such.

/** An import of a repository file; `typeOnly` when the compiler erases it (`import type`, `export type`). */
export type ImportEdge = { to: string; typeOnly: boolean };
/** Repository-relative paths with forward slashes; an edge per import that resolves to a file of the repository. */
export type ImportGraph = Map<string, ImportEdge[]>;
/** Files and the files they load at run time: the graph without its type-only edges. */
export type RuntimeGraph = Map<string, string[]>;

const SOURCE = /\.(ts|tsx|mts)$/;
const CANDIDATES = ['', '.ts', '.tsx', '.mts', '.js', '.mjs', '.cjs', '/index.ts', '/index.tsx'];

function sourceFiles(root: string, entry: string): string[] {
  const full = join(root, entry);
  if (!existsSync(full)) return [];
  if (statSync(full).isFile()) return SOURCE.test(entry) ? [entry] : [];
  return readdirSync(full).flatMap((name) => (name.startsWith('.') ? [] : sourceFiles(root, `${entry}/${name}`)));
}

function resolveImport(root: string, from: string, specifier: string): string | null {
  let base: string;
  if (specifier.startsWith('@/')) base = specifier.slice(2);
  else if (specifier.startsWith('.')) base = normalize(join(dirname(from), specifier));
  else return null;
  for (const suffix of CANDIDATES) {
    const candidate = `${base}${suffix}`.split('\\').join('/');
    const full = join(root, candidate);
    if (existsSync(full) && statSync(full).isFile()) return candidate;
  }
  return null;
}

function isTypeOnlyImport(node: ts.ImportDeclaration): boolean {
  const clause = node.importClause;
  if (!clause) return false; // `import 'x'` runs the module
  if (clause.isTypeOnly) return true;
  const named = clause.namedBindings;
  return !clause.name && !!named && ts.isNamedImports(named) && named.elements.every((e) => e.isTypeOnly);
}

function isTypeOnlyExport(node: ts.ExportDeclaration): boolean {
  const clause = node.exportClause;
  return node.isTypeOnly || (!!clause && ts.isNamedExports(clause) && clause.elements.every((e) => e.isTypeOnly));
}

/** The module specifiers a file names, with whether each is erased by the compiler. */
export function importsOf(file: string, text: string): { specifier: string; typeOnly: boolean }[] {
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, false, ts.ScriptKind.TSX);
  const found: { specifier: string; typeOnly: boolean }[] = [];
  const visit = (node: ts.Node): void => {
    if (ts.isImportDeclaration(node) && ts.isStringLiteral(node.moduleSpecifier))
      found.push({ specifier: node.moduleSpecifier.text, typeOnly: isTypeOnlyImport(node) });
    else if (ts.isExportDeclaration(node) && node.moduleSpecifier && ts.isStringLiteral(node.moduleSpecifier))
      found.push({ specifier: node.moduleSpecifier.text, typeOnly: isTypeOnlyExport(node) });
    else if (
      ts.isImportTypeNode(node) &&
      ts.isLiteralTypeNode(node.argument) &&
      ts.isStringLiteral(node.argument.literal)
    )
      found.push({ specifier: node.argument.literal.text, typeOnly: true });
    else if (
      ts.isCallExpression(node) &&
      node.expression.kind === ts.SyntaxKind.ImportKeyword &&
      node.arguments[0] &&
      ts.isStringLiteral(node.arguments[0])
    )
      found.push({ specifier: node.arguments[0].text, typeOnly: false });
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

/** Every import of the source files under `entries` (folders or files, relative to `root`). */
export function buildImportGraph(root: string, entries: readonly string[]): ImportGraph {
  const graph: ImportGraph = new Map();
  for (const file of entries.flatMap((e) => sourceFiles(root, e))) {
    const edges = new Map<string, boolean>();
    for (const { specifier, typeOnly } of importsOf(file, readFileSync(join(root, file), 'utf8'))) {
      const to = resolveImport(root, file, specifier);
      if (to) edges.set(to, (edges.get(to) ?? true) && typeOnly);
    }
    graph.set(
      file,
      [...edges].map(([to, typeOnly]) => ({ to, typeOnly })),
    );
  }
  return graph;
}

/** The graph of what loads what at run time: type-only imports are erased and cannot form a loading cycle. */
export function runtimeGraph(graph: ImportGraph): RuntimeGraph {
  return new Map([...graph].map(([file, edges]) => [file, edges.filter((e) => !e.typeOnly).map((e) => e.to)]));
}

/** Strongly connected groups of two or more files (or a file importing itself): each is an import cycle. */
export function findCycles(graph: RuntimeGraph): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const cycles: string[][] = [];
  let next = 0;
  // Tarjan's algorithm, iterative so a long chain of imports cannot overflow the call stack.
  for (const start of graph.keys()) {
    if (index.has(start)) continue;
    const work: [string, number][] = [[start, 0]];
    while (work.length) {
      const frame = work[work.length - 1]!;
      const [node, i] = frame;
      if (i === 0 && !index.has(node)) {
        index.set(node, next);
        low.set(node, next++);
        stack.push(node);
        onStack.add(node);
      }
      const targets = graph.get(node) ?? [];
      if (i < targets.length) {
        frame[1] = i + 1;
        const t = targets[i]!;
        if (!graph.has(t)) continue;
        if (!index.has(t)) work.push([t, 0]);
        else if (onStack.has(t)) low.set(node, Math.min(low.get(node)!, index.get(t)!));
        continue;
      }
      work.pop();
      const parent = work[work.length - 1];
      if (parent) low.set(parent[0], Math.min(low.get(parent[0])!, low.get(node)!));
      if (low.get(node) !== index.get(node)) continue;
      const group: string[] = [];
      let member: string;
      do {
        member = stack.pop()!;
        onStack.delete(member);
        group.push(member);
      } while (member !== node);
      if (group.length > 1 || targets.includes(node)) cycles.push(group.sort());
    }
  }
  return cycles;
}

/**
 * The folder a private path belongs to: `app/(desk)/size/_lib/x.ts` is private to `app/(desk)/size`.
 * Next.js leaves folders whose name starts with `_` out of routing; only their own route may read them.
 */
export function privateOwner(file: string): string | null {
  const parts = file.split('/');
  const at = parts.findIndex((p, i) => i > 0 && p.startsWith('_'));
  return parts[0] === 'app' && at > 0 ? parts.slice(0, at).join('/') : null;
}

export type Offence = { file: string; imports: string };

/** Imports (type-only ones too) of a route's private folder from outside that route. */
export function privateImports(graph: ImportGraph): Offence[] {
  return [...graph].flatMap(([file, edges]) =>
    edges
      .filter(({ to }) => {
        const owner = privateOwner(to);
        return owner !== null && !file.startsWith(`${owner}/`);
      })
      .map(({ to }) => ({ file, imports: to })),
  );
}

/** Imports (type-only ones too) from `file`s matching `from` into paths under `into`. */
export function importsInto(graph: ImportGraph, from: (file: string) => boolean, into: string): Offence[] {
  return [...graph].flatMap(([file, edges]) =>
    from(file) ? edges.filter(({ to }) => to.startsWith(into)).map(({ to }) => ({ file, imports: to })) : [],
  );
}

/** One "file -> import" line per offence, for a failure message. */
export function listOffences(offences: readonly Offence[]): string {
  return offences.map((o) => `${o.file} -> ${o.imports}`).join('\n');
}
