/** @jsxRuntime automatic @jsxImportSource react */
import { block, type Block } from './blocks';
import { pdfKit } from './kit';
import { styles } from './theme';

function Highlights({ items, color }: { items: { label: string; value: string }[]; color: string }) {
  const { View, Text } = pdfKit();
  return (
    <View style={[styles.highlight, { borderColor: color }]} wrap={false}>
      {items.map((it, i) => (
        <View key={i} style={styles.highlightCell}>
          <Text style={styles.idLabel}>{it.label}</Text>
          <Text style={[styles.highlightValue, { color }]}>{it.value}</Text>
        </View>
      ))}
    </View>
  );
}

/** The figures a reader looks for first, boxed at the head of the results. */
export function highlightBlock(key: string, items: { label: string; value: string }[], color: string): Block {
  return block(key, 42, <Highlights items={items} color={color} />);
}
