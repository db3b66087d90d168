/** @jsxRuntime automatic @jsxImportSource react */
import { formatIssueDate } from '../format';
import type { DatasheetSnapshot } from '../snapshot';
import { block, headingBlock, tableBlocks, type Block } from './blocks';
import { pdfKit } from './kit';
import { HEADING_PT } from './measure';
import { styles } from './theme';

/** What a revision line says when it was issued without a note. */
function defaultDescription(index: number, sizingVersion: number | undefined): string {
  const from = sizingVersion ? ` from sizing version ${sizingVersion}` : '';
  return index === 0 ? `First issue${from}` : `Re-issued${from}`;
}

/** Every revision letter with its date, note, issuer and status: all but the last are superseded by the next. */
export function revisionBlocks(s: DatasheetSnapshot): Block[] {
  const rows = s.revisions.map((r, i) => [
    r.revision,
    formatIssueDate(r.issuedAt),
    r.note ?? defaultDescription(i, r.sizingVersion),
    r.issuedByName ?? '—',
    i < s.revisions.length - 1 ? `Superseded by ${s.revisions[i + 1]!.revision}` : 'Current',
  ]);
  const columns = [
    { title: 'Rev.', widthPct: 7 },
    { title: 'Date', widthPct: 13 },
    { title: 'Description', widthPct: 42 },
    { title: 'Issued by', widthPct: 20 },
    { title: 'Status', widthPct: 18 },
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
