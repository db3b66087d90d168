import 'server-only';
import { PDFDocument } from 'pdf-lib';

/** Pages in a PDF, read with the same library that binds them (quote documents use compressed object streams). */
export async function pdfPageCount(bytes: Uint8Array): Promise<number> {
  return (await PDFDocument.load(bytes, { updateMetadata: false })).getPageCount();
}

/**
 * One PDF: the cover's pages, then every page of each datasheet in the order given. Pages are copied object for object
 * from the stored bytes, so each datasheet reads exactly as it was issued (its own running head, footer and page numbers).
 * Returns the bytes with their page count, so nothing parses them again to count.
 */
export async function bindPdfs(
  cover: Uint8Array,
  datasheets: Uint8Array[],
  meta: { title: string; subject: string; boundAt: Date },
): Promise<{ bytes: Buffer; pageCount: number }> {
  const out = await PDFDocument.create({ updateMetadata: false });
  for (const part of [cover, ...datasheets]) {
    const src = await PDFDocument.load(part, { updateMetadata: false });
    const pages = await out.copyPages(src, src.getPageIndices());
    for (const p of pages) out.addPage(p);
  }
  out.setTitle(meta.title);
  out.setSubject(meta.subject);
  out.setAuthor('Dutywise');
  out.setCreator('Dutywise');
  out.setProducer('Dutywise');
  out.setCreationDate(meta.boundAt);
  out.setModificationDate(meta.boundAt);
  return { bytes: Buffer.from(await out.save()), pageCount: out.getPageCount() };
}
