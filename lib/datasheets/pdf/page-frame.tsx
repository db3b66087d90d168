/** @jsxRuntime automatic @jsxImportSource react */
import type { DatasheetSnapshot } from '../snapshot';
import { pdfKit } from './kit';
import { styles } from './theme';

/** The statement every page carries: the figures are preliminary and qualified engineers decide. */
export const PRELIMINARY_STATEMENT =
  'Preliminary sizing on the stated equation of state and method. It is not a design: a qualified engineer must confirm it under the local ' +
  'pressure-equipment, electrical and hazardous-area codes before any equipment is ordered, built or installed.';

/** The thin line at the top of every page: who issued it and which document this is. */
export function RunningHead({ s }: { s: DatasheetSnapshot }) {
  const { View, Text } = pdfKit();
  return (
    <View style={styles.runningHead} fixed>
      <Text>
        <Text style={styles.wordmark}>DUTYWISE</Text> Equipment datasheet
      </Text>
      <Text>{`${s.datasheet.number}  Rev. ${s.datasheet.revision}  ${s.sizing.equipmentTag ?? ''}`}</Text>
    </View>
  );
}

/**
 * The foot of every page: the preliminary statement, the document identity and the page count. With
 * `page` the number is printed as given (a planned layout); without it the renderer fills it in per page.
 */
export function PageFooter({ s, page }: { s: DatasheetSnapshot; page?: { number: number; total: number } }) {
  const { View, Text } = pdfKit();
  return (
    <View style={styles.footer} fixed>
      <Text>{PRELIMINARY_STATEMENT}</Text>
      <View style={styles.footerRow}>
        <Text>{`${s.datasheet.number} Rev. ${s.datasheet.revision}, issued ${s.datasheet.issuedAt.slice(0, 10)} for ${s.account.name}`}</Text>
        {page ? (
          <Text>{`Page ${page.number} of ${page.total}`}</Text>
        ) : (
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        )}
      </View>
    </View>
  );
}
