// Document numbers as people say them: "DS26-501" for DS26-0501, "s26-1001" for S26-01001. The look-up
// matches the number as typed (a prefix) and, when it has fewer digits than the format pads to, the padded
// number too. Widths follow lib/numbering/next-number.ts.
const WIDTHS: Readonly<Record<string, number>> = { DS: 4, Q: 4, S: 5 };
const NUMBER = /^(DS|Q|S)(\d{2})-(\d{1,5})$/i;

/** The padded form of a short document number, or null when the text is not one (or is already full width). */
export function paddedDocumentNumber(text: string): string | null {
  const m = NUMBER.exec(text.trim());
  if (!m) return null;
  const prefix = m[1]!.toUpperCase();
  const width = WIDTHS[prefix]!;
  const seq = m[3]!;
  if (seq.length >= width) return null;
  return `${prefix}${m[2]}-${seq.padStart(width, '0')}`;
}

/** The sort a look-up uses: the one chosen, else best match when text is typed and newest otherwise. */
export function effectiveSort<S extends string>(
  sort: S | undefined,
  q: string | undefined,
): S | 'relevance' | 'newest' {
  return sort ?? (q ? 'relevance' : 'newest');
}
