// The sheet's fonts are the IBM Plex Latin subsets: Basic Latin, Latin-1 and a few punctuation marks. Anything
// else would print as an empty box, so text is spelt with covered characters before it reaches the renderer.
// COVERED is checked against the font files themselves in tests/unit/datasheets/glyphs.test.ts.
export const COVERED =
  /^[\u0020-\u007E\u00A0-\u00FF\u0152\u0153\u2013\u2014\u2018\u2019\u201C\u201D\u2022\u2026\u2032\u2033\u20AC\u2122\u2212]*$/u;

const SPELLED: Record<string, string> = {
  '≈': '~',
  '≃': '~',
  '∼': '~',
  '≠': '!=',
  '≤': '<=',
  '≥': '>=',
  '→': '->',
  '←': '<-',
  '⇒': '=>',
  '∞': 'infinity',
  '√': 'sqrt',
  '∑': 'sum',
  Σ: 'sum',
  '∂': 'd',
  '∝': 'proportional to',
  '‰': ' per mille',
  '℃': '°C',
  '℉': '°F',
  '⁻': '-',
  '‑': '-',
  '‐': '-',
  '\u2009': ' ',
  '\u202F': ' ',
  '\u200B': '',
};

// Greek letters by name, as engineers write them in plain text (eta, kappa, rho).
const GREEK =
  'alpha beta gamma delta epsilon zeta eta theta iota kappa lambda mu nu xi omicron pi rho sigma tau upsilon phi chi psi omega'.split(
    ' ',
  );

function greek(c: string): string | null {
  const code = c.codePointAt(0)!;
  const lower = code >= 0x3b1 && code <= 0x3c9 ? code - 0x3b1 : code >= 0x391 && code <= 0x3a9 ? code - 0x391 : -1;
  if (lower < 0) return null;
  // U+03C2 (final sigma) and U+03A2 (unassigned) sit inside the run: skip them when counting.
  const index = lower > 17 ? lower - 1 : lower;
  if (code === 0x3c2) return 'sigma';
  const name = GREEK[index];
  if (!name) return null;
  return code < 0x3b1 ? name[0]!.toUpperCase() + name.slice(1) : name;
}

// ¹ ² ³ are in Latin-1; the other superscript digits are not.
const SUPERSCRIPT: Record<string, string> = { '⁰': '0', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9' };

/** The text with every character the sheet's fonts lack spelt out ("Z ~ 0.960", "eta", "<="), or '?' as a last resort. */
export function pdfSafeText(text: string): string {
  if (COVERED.test(text)) return text;
  let out = '';
  const chars = [...text];
  for (const [i, c] of chars.entries()) {
    if (COVERED.test(c)) out += c;
    else if (c in SPELLED) out += SPELLED[c];
    else if (c in SUPERSCRIPT) out += `^${SUPERSCRIPT[c]}`;
    else {
      const g = greek(c);
      // A spelt-out letter before another letter keeps a space: "Delta p", not "Deltap".
      if (g) out += /[\p{L}\p{N}]/u.test(chars[i + 1] ?? '') ? `${g} ` : g;
      else {
        // Accented letters outside Latin-1 (ő, ł) lose the accent rather than the letter.
        const bare = c.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
        out += bare && COVERED.test(bare) ? bare : '?';
      }
    }
  }
  return out;
}
