/** @jsxRuntime automatic @jsxImportSource react */
import { Fragment } from 'react';
import type { DatasheetSnapshot } from '../snapshot';
import type { Block } from './blocks';
import { pdfKit } from './kit';
import { PageFooter, RunningHead } from './page-frame';
import { styles } from './theme';

/**
 * The datasheet on A4 with the running head and footer on every page. With `pages` each planned page is
 * an explicit page with its number printed; without, the blocks flow and the renderer numbers the pages.
 */
export function DatasheetDocument({
  s,
  blocks,
  pages,
}: {
  s: DatasheetSnapshot;
  blocks: Block[];
  pages: Block[][] | null;
}) {
  const { Document, Page } = pdfKit();
  const layout = pages ?? [blocks];
  return (
    <Document
      title={`${s.datasheet.number} Rev. ${s.datasheet.revision} ${s.sizing.title}`}
      author="Dutywise"
      subject={`Datasheet for ${s.account.name}${s.sizing.equipmentTag ? `, ${s.sizing.equipmentTag}` : ''}`}
      creator="Dutywise"
      producer="Dutywise"
      creationDate={new Date(s.datasheet.issuedAt)}
      modificationDate={new Date(s.datasheet.issuedAt)}
    >
      {layout.map((page, i) => (
        <Page key={i} size="A4" style={styles.page}>
          <RunningHead s={s} />
          <PageFooter s={s} page={pages ? { number: i + 1, total: pages.length } : undefined} />
          {page.map((b) => (
            <Fragment key={b.key}>{b.node}</Fragment>
          ))}
        </Page>
      ))}
    </Document>
  );
}
