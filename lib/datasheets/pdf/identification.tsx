/** @jsxRuntime automatic @jsxImportSource react */
import { formatIssueDate } from '../format';
import { serviceLabel, type DatasheetSnapshot } from '../snapshot';
import { block, type Block } from './blocks';
import { pdfKit } from './kit';
import { EXTRA_LINE_PT, linesIn, pct } from './measure';
import { styles } from './theme';

function Cell({ label, value }: { label: string; value: string }) {
  const { View, Text } = pdfKit();
  return (
    <View style={styles.idCell}>
      <Text style={styles.idLabel}>{label}</Text>
      <Text style={styles.idValue}>{value}</Text>
    </View>
  );
}

function cells(s: DatasheetSnapshot): [string, string][] {
  const d = s.datasheet;
  return [
    ['Datasheet', d.number],
    ['Revision', d.revision],
    ['Issued', formatIssueDate(d.issuedAt)],
    ['Sizing record', `${s.sizing.number} (v${s.sizing.revision})`],
    ['Customer', s.account.name],
    ['Site', s.account.site ?? 'not stated'],
    ['Equipment tag', s.sizing.equipmentTag ?? 'not assigned'],
    ['Service', s.result.service === 'heater' ? 'Gas heating' : 'Gas compression'],
  ];
}

function Identification({ s }: { s: DatasheetSnapshot }) {
  const { View, Text } = pdfKit();
  return (
    <View wrap={false}>
      <Text style={styles.title}>{s.sizing.title}</Text>
      <Text style={styles.subtitle}>{serviceLabel(s)}</Text>
      <View style={[styles.idGrid, { flexWrap: 'wrap' }]}>
        {cells(s).map(([label, value]) => (
          <Cell key={label} label={label} value={value} />
        ))}
      </View>
      {s.sizing.notes ? <Text style={[styles.small, { marginTop: 4 }]}>{`Notes: ${s.sizing.notes}`}</Text> : null}
    </View>
  );
}

/** Title and the identification grid at the head of the first page. */
export function identificationBlocks(s: DatasheetSnapshot): Block[] {
  const rows = [cells(s).slice(0, 4), cells(s).slice(4)];
  const grid = rows.reduce(
    (h, r) => h + 30 + EXTRA_LINE_PT * (Math.max(...r.map(([, v]) => linesIn(v, pct(25) - 8, 'bold'))) - 1),
    0,
  );
  const title = 20 * linesIn(s.sizing.title, pct(100), 'title') + 16;
  const notes = s.sizing.notes ? 4 + 9 * linesIn(`Notes: ${s.sizing.notes}`, pct(100), 'small') : 0;
  return [block('id', title + grid + notes, <Identification s={s} />)];
}
