// Height estimates in points for the theme's type sizes, used to plan which rows go on which page.
// The renderer's page count is checked after rendering, so an estimate that is off costs time (a flowing
// re-render), never a wrong page number. [calc: measured from rendered sheets and rounded up]
export const PAGE_CONTENT_PT = 842 - 44 - 58;
export const CONTENT_WIDTH_PT = 595 - 2 * 36;
export const ROW_PT = 14;
export const EXTRA_LINE_PT = 10.5;
export const HEADING_PT = 32;

export type Face = 'sans' | 'mono' | 'small' | 'bold' | 'title';

// Average advance per character: about 0.45 em for the sans face (taken as 0.47 em to stay on the safe
// side), exactly 0.6 em for the mono face.
const CHAR_PT: Record<Face, number> = {
  sans: 8 * 0.47,
  bold: 8.5 * 0.55,
  title: 15 * 0.55,
  mono: 7.6 * 0.6,
  small: 6.8 * 0.5,
};

/** Lines a string needs in a column `widthPt` wide, allowing for words that do not fill a line. */
export function linesIn(text: string | null | undefined, widthPt: number, face: Face = 'sans'): number {
  const perLine = Math.max(1, Math.floor((widthPt / CHAR_PT[face]) * 0.92));
  return Math.max(1, Math.ceil((text ?? '').length / perLine));
}

/** A table or label row whose tallest cell decides its height. */
export function rowHeight(cells: { text: string | null | undefined; widthPt: number; face?: Face }[]): number {
  const lines = Math.max(1, ...cells.map((c) => linesIn(c.text, c.widthPt, c.face)));
  return ROW_PT + EXTRA_LINE_PT * (lines - 1);
}

/** Percent of the content width, in points. */
export const pct = (p: number) => (CONTENT_WIDTH_PT * p) / 100;
