/** @jsxRuntime automatic @jsxImportSource react */
import { createElement, Fragment } from 'react';
import { loadPdfKit, pdfKit, type PdfKit } from '@/lib/datasheets/pdf/kit';
import { PRELIMINARY_STATEMENT } from '@/lib/datasheets/pdf/page-frame';
import { styles } from '@/lib/datasheets/pdf/theme';
import type { Block } from '@/lib/datasheets/pdf/blocks';
import type { CoverModel } from './cover-model';
import { coverBlocks } from './cover-sections';

function CoverDocument({ m, blocks, boundAt }: { m: CoverModel; blocks: Block[]; boundAt: Date }) {
  const { Document, Page, View, Text } = pdfKit();
  return (
    <Document
      title={`${m.reference} ${m.title}`}
      author="Dutywise"
      creator="Dutywise"
      producer="Dutywise"
      creationDate={boundAt}
      modificationDate={boundAt}
    >
      <Page size="A4" style={styles.page}>
        <View style={styles.runningHead} fixed>
          <Text>
            <Text style={styles.wordmark}>DUTYWISE</Text> Quote cover sheet
          </Text>
          <Text>{m.reference}</Text>
        </View>
        <View style={styles.footer} fixed>
          <Text>{PRELIMINARY_STATEMENT}</Text>
          <View style={styles.footerRow}>
            <Text>{`${m.reference}, cover sheet`}</Text>
            <Text render={({ pageNumber, totalPages }) => `Cover page ${pageNumber} of ${totalPages}`} />
          </View>
        </View>
        {blocks.map((b) => (
          <Fragment key={b.key}>{b.node}</Fragment>
        ))}
      </Page>
    </Document>
  );
}

/** The cover sheet as PDF bytes, in Dutywise's datasheet look; every string passes the fonts' glyph check. */
export async function renderCoverPdf(m: CoverModel, boundAt: Date): Promise<Buffer> {
  const kit = await loadPdfKit();
  const element = createElement(CoverDocument, { m, blocks: coverBlocks(m), boundAt }) as unknown as Parameters<
    PdfKit['renderToBuffer']
  >[0];
  return kit.renderToBuffer(element);
}
