// Revisions run A..Z, then AA..AZ, BA..ZZ (bijective base 26), as the database's check allows: 702 in all.
const LETTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ';
export const MAX_REVISIONS = 26 + 26 * 26;

/** The letter for the n-th revision, counting from 0 ('A'); null past 'ZZ'. */
export function revisionLetterAt(index: number): string | null {
  if (!Number.isInteger(index) || index < 0 || index >= MAX_REVISIONS) return null;
  if (index < 26) return LETTERS[index]!;
  const rest = index - 26;
  return LETTERS[Math.floor(rest / 26)]! + LETTERS[rest % 26]!;
}

/** The position of a letter ('A' is 0, 'AA' is 26), or null if it is not a revision letter. */
export function revisionIndexOf(letter: string): number | null {
  if (!/^[A-Z]{1,2}$/.test(letter)) return null;
  const v = (c: string) => LETTERS.indexOf(c);
  return letter.length === 1 ? v(letter) : 26 + v(letter[0]!) * 26 + v(letter[1]!);
}

/** The letter after `previous` ('A' for a first issue, 'AA' after 'Z'); null when 'ZZ' is used up. */
export function nextRevisionLetter(previous: string | null): string | null {
  if (previous === null) return 'A';
  const i = revisionIndexOf(previous);
  return i === null ? null : revisionLetterAt(i + 1);
}

/** Sorts revision letters in issue order (B before AA, which plain string order gets wrong). */
export function compareRevisionLetters(a: string, b: string): number {
  return (revisionIndexOf(a) ?? -1) - (revisionIndexOf(b) ?? -1);
}

/** How a revision stands among the datasheet's revisions (given in issue order): current, or superseded by the next. */
export function revisionStatus(revisions: readonly { revision: string }[], index: number): string {
  const next = revisions[index + 1];
  return next ? `Superseded by ${next.revision}` : 'Current';
}
