import { describe, expect, it } from 'vitest';
import { decodeCursor, encodeCursor, SORTS } from '@/lib/support/keyset';
import { roundAbout } from '@/lib/support/count';

const id = '0b7c5a0e-6f0e-4a43-9d53-1f2a3b4c5d6e';

describe('look-up page cursors', () => {
  it('round-trip a keyed position and the close-spelling flag', () => {
    const c = { after: { key: '2026-03-04 05:06:07.123456+00', id }, close: true };
    expect(decodeCursor(encodeCursor(c), SORTS.newest)).toEqual(c);
    const kw = { after: { key: '1234.5678901234567', id }, close: false };
    expect(decodeCursor(encodeCursor(kw), SORTS.largest)).toEqual(kw);
  });

  it('start from the first page when a cursor is damaged or made for another sort', () => {
    expect(decodeCursor('not-base64-json', SORTS.newest)).toEqual({});
    const kw = encodeCursor({ after: { key: '12.5', id } });
    expect(decodeCursor(kw, SORTS.newest)).toEqual({});
    const injected = encodeCursor({ after: { key: "2026-01-01'); drop table sizings; --", id } });
    expect(decodeCursor(injected, SORTS.oldest)).toEqual({});
    expect(decodeCursor(encodeCursor({ after: { key: '12.5', id: 'x' } }), SORTS.largest)).toEqual({});
  });

  it('carry an offset for the relevance order, within bounds', () => {
    expect(decodeCursor(encodeCursor({ offset: 50 }), null)).toEqual({ offset: 50, close: false });
    expect(decodeCursor(encodeCursor({ offset: -1 }), null)).toEqual({});
    expect(decodeCursor(encodeCursor({ offset: 1e9 }), null)).toEqual({});
  });
});

describe('"about" totals', () => {
  it('keep two significant digits', () => {
    expect(roundAbout(58_581)).toBe(59_000);
    expect(roundAbout(1_234)).toBe(1_200);
    expect(roundAbout(987)).toBe(990);
    expect(roundAbout(42)).toBe(42);
  });
});
