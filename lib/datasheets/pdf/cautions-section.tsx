/** @jsxRuntime automatic @jsxImportSource react */
import type { Severity, SizingWarning } from '@/lib/engine';
import { severityLabel } from '../format';
import { block, headingBlock, type Block } from './blocks';
import { pdfKit } from './kit';
import { pct, rowHeight } from './measure';
import { colors, styles } from './theme';

const ORDER: Record<Severity, number> = { danger: 0, warning: 1, caution: 2, info: 3 };

/** The engine's warnings, most severe first; sort is stable so the engine's order holds within a level. */
export function sortedWarnings(warnings: SizingWarning[]): SizingWarning[] {
  return [...warnings].sort((a, b) => ORDER[a.severity] - ORDER[b.severity]);
}

function Caution({ w }: { w: SizingWarning }) {
  const { View, Text } = pdfKit();
  return (
    <View style={styles.row} wrap={false}>
      <Text style={{ width: '13%', fontWeight: 600, color: colors.severity[w.severity] }}>
        {severityLabel(w.severity)}
      </Text>
      <Text style={{ width: '87%' }}>{w.message}</Text>
    </View>
  );
}

/** Every warning and caution with its severity, one block each. */
export function cautionBlocks(warnings: SizingWarning[]): Block[] {
  return [
    headingBlock('5', 'Warnings and cautions'),
    ...sortedWarnings(warnings).map((w, i) =>
      block(`w${i}`, rowHeight([{ text: w.message, widthPt: pct(87) }]), <Caution w={w} />),
    ),
  ];
}
