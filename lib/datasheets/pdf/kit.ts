import path from 'node:path';
import { createElement, type ReactNode } from 'react';
import type ReactPdf from '@react-pdf/renderer';
import { pdfSafeText } from './glyphs';
import type { Styles } from '@react-pdf/renderer';

export type PdfKit = typeof ReactPdf;
export type PdfStyle = Styles[string];

// The fonts live in the repository (not node_modules) so a standalone build can ship them.
// Plain TrueType unpacked from the @fontsource WOFF files; fonts/README.md says why.
const FONT_DIR = path.join(process.cwd(), 'lib', 'datasheets', 'fonts');
export const SANS = 'DutywiseSans';
export const MONO = 'DutywiseMono';

let kit: PdfKit | null = null;

function safeChildren(children: ReactNode): ReactNode {
  if (typeof children === 'string') return pdfSafeText(children);
  if (Array.isArray(children)) return children.map(safeChildren);
  return children;
}

/** The renderer with a Text that spells out characters the fonts lack (see glyphs.ts) in every string it prints. */
function withSafeText(k: PdfKit): PdfKit {
  const Plain = k.Text;
  const Text = (({ children, ...props }: { children?: ReactNode }) =>
    createElement(Plain, props, ...[safeChildren(children)].flat())) as unknown as typeof k.Text;
  // Module namespaces are frozen: a new object with the module's members and this Text in its place.
  return { ...k, Text } as unknown as PdfKit;
}
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
    kit = withSafeText(k);
    return kit;
  });
  return loading;
}

/** The loaded renderer's components; the document is only rendered after loadPdfKit() resolves. */
export function pdfKit(): PdfKit {
  if (!kit) throw new Error('loadPdfKit() must complete before a datasheet is rendered');
  return kit;
}
