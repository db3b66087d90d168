import path from 'node:path';
import type ReactPdf from '@react-pdf/renderer';
import type { Styles } from '@react-pdf/renderer';

export type PdfKit = typeof ReactPdf;
export type PdfStyle = Styles[string];

// The fonts live in the repository (not node_modules) so a standalone build can ship them.
// Plain TrueType unpacked from the @fontsource WOFF files; fonts/README.md says why.
const FONT_DIR = path.join(process.cwd(), 'lib', 'datasheets', 'fonts');
export const SANS = 'DutywiseSans';
export const MONO = 'DutywiseMono';

let kit: PdfKit | null = null;
let loading: Promise<PdfKit> | null = null;

function registerFonts(k: PdfKit): void {
  k.Font.register({
    family: SANS,
    fonts: [
      { src: path.join(FONT_DIR, 'ibm-plex-sans-latin-400-normal.ttf'), fontWeight: 400 },
      { src: path.join(FONT_DIR, 'ibm-plex-sans-latin-600-normal.ttf'), fontWeight: 600 },
    ],
  });
  k.Font.register({ family: MONO, src: path.join(FONT_DIR, 'ibm-plex-mono-latin-400-normal.ttf') });
  // Tags, numbers and standards references must never be split across lines with a hyphen.
  k.Font.registerHyphenationCallback((word) => [word]);
}

/**
 * Loads the renderer once per process. It is an ESM-only package; loading it with import() works alike in
 * Next's server bundle, vitest and tsx scripts (which compile project files to CommonJS and cannot require it).
 */
export function loadPdfKit(): Promise<PdfKit> {
  loading ??= import('@react-pdf/renderer').then((m) => {
    const k = m as unknown as PdfKit;
    registerFonts(k);
    kit = k;
    return k;
  });
  return loading;
}

/** The loaded renderer's components; the document is only rendered after loadPdfKit() resolves. */
export function pdfKit(): PdfKit {
  if (!kit) throw new Error('loadPdfKit() must complete before a datasheet is rendered');
  return kit;
}
