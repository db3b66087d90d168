/** @jsxRuntime automatic @jsxImportSource react */
// The pragma above: tsx scripts (the benchmark) compile JSX classically unless told; Next and vitest ignore it.
import type { ReactNode } from 'react';
import { pdfKit, type PdfStyle } from './kit';
import { HEADING_PT, pct, rowHeight } from './measure';
import { styles } from './theme';

/** One unbreakable piece of the sheet with its estimated height; pages are planned from these. */
export type Block = { key: string; heightPt: number; node: ReactNode; keepWithNext?: boolean };

function Heading({ no, title }: { no: string; title: string }) {
  const { View, Text } = pdfKit();
  return (
    <View style={[styles.section, styles.sectionHead]} wrap={false} minPresenceAhead={40}>
      <Text style={styles.sectionNo}>{no}</Text>
      <Text style={styles.sectionTitle}>{title}</Text>
    </View>
  );
}

/** A numbered section heading that always travels with the block after it. */
export function headingBlock(no: string, title: string): Block {
  return { key: `h${no}`, heightPt: HEADING_PT, node: <Heading no={no} title={title} />, keepWithNext: true };
}

/** [label, value, remark?] */
export type KvRow = [string, string, string?];

function KvLine({ row: [label, value, remark], labelPct, mono }: { row: KvRow; labelPct: number; mono: boolean }) {
  const { View, Text } = pdfKit();
  return (
    <View style={styles.row} wrap={false}>
      <Text style={[styles.label, { width: `${labelPct}%` }]}>{label}</Text>
      <Text style={[mono ? styles.value : {}, { flexGrow: 1, flexBasis: 0 }]}>{value}</Text>
      {remark ? <Text style={[styles.small, { width: '30%' }]}>{remark}</Text> : null}
    </View>
  );
}

/** Label and value rows, one block each; figures in the mono face so they line up, prose in the text face. */
export function kvBlocks(key: string, rows: KvRow[], opts: { labelPct?: number; mono?: boolean } = {}): Block[] {
  const labelPct = opts.labelPct ?? 34;
  const mono = opts.mono ?? true;
  return rows.map((row, i) => ({
    key: `${key}${i}`,
    heightPt: rowHeight([
      { text: row[0], widthPt: pct(labelPct) },
      { text: row[1], widthPt: pct(100 - labelPct - (row[2] ? 30 : 0)), face: mono ? 'mono' : 'sans' },
      { text: row[2], widthPt: pct(30), face: 'small' },
    ]),
    node: <KvLine row={row} labelPct={labelPct} mono={mono} />,
  }));
}

export type Column = { title: string; widthPct: number; align?: 'left' | 'right' };

function TableLine({
  columns,
  cells,
  head,
  mono,
}: {
  columns: Column[];
  cells: string[];
  head: boolean;
  mono: boolean;
}) {
  const { View, Text } = pdfKit();
  const cell = (c: Column, j: number): PdfStyle[] => [
    { width: `${c.widthPct}%`, textAlign: c.align ?? 'left', paddingHorizontal: 2 },
    ...(!head && mono && j > 0 ? [styles.value] : []),
  ];
  return (
    <View style={head ? styles.headRow : styles.row} wrap={false}>
      {columns.map((c, j) => (
        <Text key={j} style={cell(c, j)}>
          {cells[j] ?? ''}
        </Text>
      ))}
    </View>
  );
}

/**
 * A table as blocks: a shaded header row, then one block per row, each kept with the next so the page planner
 * never splits a table across pages (a table taller than a page falls back to the flowing layout).
 */
export function tableBlocks(key: string, columns: Column[], rows: string[][], mono = true): Block[] {
  const height = (cells: string[], face: 'sans' | 'mono') =>
    rowHeight(columns.map((c, j) => ({ text: cells[j], widthPt: pct(c.widthPct) - 4, face: j > 0 ? face : 'sans' })));
  const head: Block = {
    key: `${key}h`,
    heightPt: height(
      columns.map((c) => c.title),
      'sans',
    ),
    node: <TableLine columns={columns} cells={columns.map((c) => c.title)} head mono={mono} />,
    keepWithNext: true,
  };
  return [
    head,
    ...rows.map((cells, i) => ({
      key: `${key}${i}`,
      heightPt: height(cells, mono ? 'mono' : 'sans'),
      node: <TableLine columns={columns} cells={cells} head={false} mono={mono} />,
      keepWithNext: i < rows.length - 1,
    })),
  ];
}

/** Any other piece (a boxed figure set, a two-column panel) with its own height estimate. */
export function block(key: string, heightPt: number, node: ReactNode, keepWithNext = false): Block {
  return { key, heightPt, node, keepWithNext };
}
