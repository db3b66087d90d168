import { describe, expect, it } from 'vitest';
import { DESK_PATH, safeNextPath } from '@/lib/security/safe-redirect';

// Open-redirect payloads as browsers read them: WHATWG URL parsing turns "\" into "/" and drops tabs and newlines,
// so "/\evil.example" and "/\t/evil.example" both become "//evil.example", another host [pub: WHATWG URL Standard,
// "URL parsing", special-scheme backslash and ASCII tab or newline handling].
const app = 'https://desk.dutywise.test';

describe('the sign-in redirect stays on the site', () => {
  it.each([
    ['/%5Cevil.example'],
    ['/%09/evil.example'],
    ['/\\evil.example'],
    ['/\t/evil.example'],
    ['//evil.example/path'],
    ['/%2F%2Fevil.example'],
    ['https://evil.example/size'],
    ['https://desk.dutywise.test.evil.example/size'],
    ['javascript:alert(1)'],
    ['size'],
    [''],
    [undefined],
    [['/%5Cevil.example']],
  ])('%j lands on the desk', (next) => {
    expect(safeNextPath(next, app)).toBe(DESK_PATH);
  });

  it('keeps a path on the site with its query and fragment', () => {
    expect(safeNextPath('/quotes/abc?tab=lines#l2', app)).toBe('/quotes/abc?tab=lines#l2');
    expect(safeNextPath('/sizings', app)).toBe('/sizings');
    expect(safeNextPath('https://desk.dutywise.test/billing', app)).toBe(DESK_PATH);
  });
});
