import { MONO, SANS, type PdfStyle } from './kit';

// Dutywise's paper palette (the same tokens as the desk): graphite ink, copper for heat, teal for compression.
export const colors = {
  ink: '#1c232b',
  soft: '#3b4653',
  muted: '#5c6773',
  line: '#d9d3c7',
  sunk: '#f3f0e9',
  copper: '#9a4621',
  tide: '#16565d',
  severity: { info: '#1f5f99', caution: '#8a6100', warning: '#a3430f', danger: '#a3162b' },
} as const;

const s = <T extends Record<string, PdfStyle>>(styles: T): T => styles;

export const styles = s({
  page: { fontFamily: SANS, fontSize: 8, color: colors.ink, paddingTop: 44, paddingBottom: 58, paddingHorizontal: 36 },
  runningHead: { position: 'absolute', top: 18, left: 36, right: 36, flexDirection: 'row', justifyContent: 'space-between', fontSize: 7, color: colors.muted, borderBottomWidth: 0.5, borderBottomColor: colors.line, paddingBottom: 3 },
  wordmark: { fontWeight: 600, color: colors.copper },
  footer: { position: 'absolute', bottom: 18, left: 36, right: 36, borderTopWidth: 0.5, borderTopColor: colors.line, paddingTop: 4, fontSize: 6.5, color: colors.soft },
  footerRow: { flexDirection: 'row', justifyContent: 'space-between', marginTop: 2, color: colors.muted },
  title: { fontSize: 15, fontWeight: 600, marginBottom: 2 },
  subtitle: { fontSize: 9, color: colors.soft, marginBottom: 8 },
  section: { marginTop: 10 },
  sectionHead: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.ink, paddingBottom: 2, marginBottom: 4 },
  sectionNo: { width: 16, fontWeight: 600, color: colors.copper },
  sectionTitle: { fontWeight: 600, fontSize: 9, textTransform: 'uppercase', letterSpacing: 0.6 },
  row: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: colors.line, paddingVertical: 1.6 },
  headRow: { flexDirection: 'row', backgroundColor: colors.sunk, paddingVertical: 2, fontWeight: 600, fontSize: 7, color: colors.soft },
  label: { color: colors.soft },
  value: { fontFamily: MONO, fontSize: 7.6 },
  strong: { fontWeight: 600 },
  small: { fontSize: 6.8, color: colors.muted },
  idGrid: { flexDirection: 'row', borderWidth: 1, borderColor: colors.ink },
  idCell: { width: '25%', padding: 4, borderRightWidth: 0.5, borderRightColor: colors.line, borderBottomWidth: 0.5, borderBottomColor: colors.line },
  idLabel: { fontSize: 6, color: colors.muted, textTransform: 'uppercase', letterSpacing: 0.5 },
  idValue: { fontSize: 8.5, fontWeight: 600 },
  highlight: { flexDirection: 'row', borderWidth: 1, borderColor: colors.ink, marginBottom: 6 },
  highlightCell: { flexGrow: 1, flexBasis: 0, padding: 5, borderRightWidth: 0.5, borderRightColor: colors.line },
  highlightValue: { fontSize: 12, fontWeight: 600 },
  signBox: { flexGrow: 1, flexBasis: 0, borderWidth: 0.75, borderColor: colors.ink, padding: 5, height: 64, marginRight: 6 },
});
