import { describe, expect, it } from 'vitest';
import { escapeLike, parseLookupText } from '@/lib/support/terms';

describe('reading the text typed into the look-up', () => {
  it('recognises document-number prefixes of sizings, quotes and datasheets, in any case', () => {
    expect(parseLookupText(' ds26-05 ').numberPrefix).toBe('DS26-05');
    expect(parseLookupText('S26-01001').numberPrefix).toBe('S26-01001');
    expect(parseLookupText('q2').numberPrefix).toBe('Q2');
    // a tag is not a document number, and letters alone are not a prefix
    expect(parseLookupText('EH-4711').numberPrefix).toBeNull();
    expect(parseLookupText('DS').numberPrefix).toBeNull();
  });

  it('turns plain words into text-search words and drops linking words', () => {
    const t = parseLookupText('Regeneraton  heater for the Kiln 3');
    expect(t.text).toBe('regeneraton heater for the kiln 3');
    expect(t.words).toEqual(['regeneraton', 'heater', 'kiln']);
    expect(t.numbers).toEqual(['3']);
  });

  it('treats a code mixing letters and digits as a tag, with no text search', () => {
    for (const code of ['EH-4711', 'eh 4171a', 'pump K-301']) {
      const t = parseLookupText(code);
      expect(t.words).toEqual([]);
      expect(t.numbers).toEqual([]);
    }
  });

  it('keeps letters of other alphabets as words and leaves punctuation out', () => {
    expect(parseLookupText('Trocknerluft über-hitzer').words).toEqual(['trocknerluft', 'über', 'hitzer']);
  });

  it('escapes LIKE wildcards so they match themselves', () => {
    expect(escapeLike('50%_a\\b')).toBe('50\\%\\_a\\\\b');
  });
});
