/** @jsxRuntime automatic @jsxImportSource react */
import { formatIssueDate } from '../format';
import type { DatasheetSnapshot } from '../snapshot';
import { block, headingBlock, tableBlocks, type Block } from './blocks';
import { pdfKit } from './kit';
import { HEADING_PT } from './measure';
import { styles } from './theme';

/** Every revision letter with its date, note and issuer. */
export function revisionBlocks(s: DatasheetSnapshot): Block[] {
  const rows = s.revisions.map((r, i) => [
    r.revision,
    formatIssueDate(r.issuedAt),
    r.note ?? (i === 0 ? 'First issue' : 'Re-issued'),
    r.issuedByName ?? '—',
  ]);
  const columns = [
    { title: 'Rev.', widthPct: 8 },
    { title: 'Date', widthPct: 14 },
    { title: 'Description', widthPct: 54 },
    { title: 'Issued by', widthPct: 24 },
  ];
  return [headingBlock('6', 'Revisions'), ...tableBlocks('rv', columns, rows, false)];
}

function SignOff() {
  const { View, Text } = pdfKit();
  const box = (role: string, last: boolean) => (
    <View key={role} style={[styles.signBox, last ? { marginRight: 0 } : {}]}>
      <Text style={styles.idLabel}>{role}</Text>
      <Text style={[styles.small, { marginTop: 10 }]}>Name</Text>
      <Text style={[styles.small, { marginTop: 8 }]}>Signature / date</Text>
    </View>
  );
  return (
    <View wrap={false}>
      <View style={[styles.section, styles.sectionHead]}>
        <Text style={styles.sectionNo}>7</Text>
        <Text style={styles.sectionTitle}>Sign-off</Text>
      </View>
      <View style={{ flexDirection: 'row' }}>{['Prepared', 'Checked', 'Approved'].map((r, i) => box(r, i === 2))}</View>
    </View>
  );
}

/** Blank boxes for the people who prepare, check and approve the document, kept together with their heading. */
export function signOffBlocks(): Block[] {
  return [block('so', HEADING_PT + 66, <SignOff />)];
}
