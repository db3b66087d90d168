import 'server-only';
import { createElement } from 'react';
import { logger } from '@/lib/log/logger';
import { withSheetUnits } from './format';
import type { Block } from './pdf/blocks';
import { DatasheetDocument } from './pdf/document';
import { loadPdfKit, type PdfKit } from './pdf/kit';
import { datasheetBlocks, planPages } from './pdf/sheet-blocks';
import type { DatasheetSnapshot } from './snapshot';

/** Pages in a PDF from the renderer (page objects are written uncompressed, one `/Type /Page` each). */
export function countPdfPages(bytes: Buffer): number {
  return bytes.toString('latin1').match(/\/Type\s*\/Page(?![A-Za-z])/g)?.length ?? 0;
}

function renderWith(kit: PdfKit, s: DatasheetSnapshot, blocks: Block[], pages: Block[][] | null): Promise<Buffer> {
  // renderToBuffer is typed for a <Document> element; DatasheetDocument returns exactly that.
  const element = createElement(DatasheetDocument, { s, blocks, pages }) as unknown as Parameters<
    PdfKit['renderToBuffer']
  >[0];
  return kit.renderToBuffer(element);
}

/** Diagnostics and tests: force the flowing layout, or plan against another page capacity. */
export type RenderOptions = { layout?: 'planned' | 'flow'; capacityPt?: number };

/**
 * Renders a snapshot to PDF bytes. Rows are planned onto explicit pages with their numbers printed, which
 * spares the renderer its per-page numbering pass (a third of the time); should the renderer still need a
 * different page count, the sheet is rendered again flowing and the renderer numbers the pages itself.
 */
export async function renderDatasheetPdf(snapshot: DatasheetSnapshot, opts: RenderOptions = {}): Promise<Buffer> {
  const kit = await loadPdfKit();
  // Every figure's text is made here, in one synchronous pass, in the account's units.
  const blocks = withSheetUnits(snapshot.units ?? 'si', () => datasheetBlocks(snapshot));
  const plan = opts.layout === 'flow' ? null : planPages(blocks, opts.capacityPt);
  if (plan) {
    const bytes = await renderWith(kit, snapshot, blocks, plan);
    if (countPdfPages(bytes) === plan.length) return bytes;
    logger.debug(
      { number: snapshot.datasheet.number, planned: plan.length },
      'datasheet overflowed its page plan; rendering it flowing',
    );
  }
  return renderWith(kit, snapshot, blocks, null);
}
