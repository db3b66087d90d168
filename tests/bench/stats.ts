// Small helpers shared by the benchmarks: percentiles and a results file the README points to.
import { appendFileSync, existsSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export function percentile(samples: number[], p: number): number {
  const sorted = [...samples].sort((a, b) => a - b);
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
}

const resultsFile = path.join(__dirname, 'RESULTS.md');

/** Appends a section to tests/bench/RESULTS.md (started fresh by run.sh); `note` is a paragraph above its table. */
export function recordResults(title: string, rows: [string, string, string, string][], note?: string): void {
  if (!existsSync(resultsFile)) writeFileSync(resultsFile, machineHeader());
  const lines = [
    `\n## ${title}\n`,
    ...(note ? [note, ''] : []),
    '| measure | result | target | verdict |',
    '|---|---|---|---|',
    ...rows.map((r) => `| ${r.join(' | ')} |`),
  ];
  appendFileSync(resultsFile, `${lines.join('\n')}\n`);
  console.log(`\n${title}${note ? `\n  ${note}` : ''}`);
  for (const r of rows) console.log(`  ${r[0].padEnd(48)} ${r[1].padStart(14)}   target ${r[2].padEnd(14)} ${r[3]}`);
}

/** Like recordResults, but first removes an earlier section of the same kind (the first word of its title). */
export function replaceResults(title: string, rows: [string, string, string, string][], note?: string): void {
  if (existsSync(resultsFile)) {
    const kind = title.split(' ')[0]!;
    const sections = readFileSync(resultsFile, 'utf8').split(/\n(?=## )/);
    writeFileSync(resultsFile, sections.filter((s) => !s.startsWith(`## ${kind} `)).join('\n'));
  }
  recordResults(title, rows, note);
}

export function machineHeader(): string {
  const cpu = os.cpus()[0]?.model ?? 'unknown cpu';
  return `# Benchmark results\n\nRun ${new Date().toISOString()} on ${os.cpus().length} × ${cpu}, ${(os.totalmem() / 2 ** 30).toFixed(0)} GiB, Node ${process.version}, ${os.platform()} ${os.release()}.\n`;
}

export const verdict = (ok: boolean) => (ok ? 'PASS' : 'MISS');
