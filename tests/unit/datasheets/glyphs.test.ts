import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { COVERED, pdfSafeText } from '@/lib/datasheets/pdf/glyphs';

const FONT_DIR = path.join(process.cwd(), 'lib', 'datasheets', 'fonts');
const fonts = readdirSync(FONT_DIR).filter((f) => f.endsWith('.ttf'));

function charset(file: string): Set<number> {
  const font = fontkit.create(readFileSync(path.join(FONT_DIR, file))) as unknown as { characterSet: number[] };
  return new Set(font.characterSet);
}

// Every character the sources could hand the sheet: whatever non-ASCII character appears in lib/.
function sourceCharacters(dir: string, out = new Set<string>()): Set<string> {
  for (const name of readdirSync(dir)) {
    const p = path.join(dir, name);
    if (statSync(p).isDirectory()) sourceCharacters(p, out);
    else if (/\.(ts|tsx)$/.test(name)) for (const c of readFileSync(p, 'utf8')) if (c > '~') out.add(c);
  }
  return out;
}

describe('the datasheet prints only characters its fonts have', () => {
  it('every character COVERED admits is in each shipped font', () => {
    expect(fonts.length).toBe(3);
    for (const file of fonts) {
      const set = charset(file);
      const missing: string[] = [];
      for (let cp = 0x20; cp <= 0x2212; cp++) {
        const c = String.fromCodePoint(cp);
        if (COVERED.test(c) && !set.has(cp)) missing.push(`U+${cp.toString(16)}`);
      }
      expect(missing, file).toEqual([]);
    }
  });

  it('spells out what the fonts lack: approx, Greek, comparison signs', () => {
    expect(pdfSafeText('Z ≈ 0.960')).toBe('Z ~ 0.960');
    expect(pdfSafeText('η ≥ 0.70, κ = 1.31, ρ ≤ 5 kg/m³')).toBe('eta >= 0.70, kappa = 1.31, rho <= 5 kg/m³');
    expect(pdfSafeText('Δp, Ω, ω, σ, ς')).toBe('Delta p, Omega, omega, sigma, sigma');
    expect(pdfSafeText('50 °C, 3 barg, 1,200 Nm³/h')).toBe('50 °C, 3 barg, 1,200 Nm³/h');
  });

  it('leaves no uncovered character from any string in lib/', () => {
    const chars = [...sourceCharacters(path.join(process.cwd(), 'lib'))];
    expect(chars.length).toBeGreaterThan(10);
    const bad = chars.filter((c) => !COVERED.test(pdfSafeText(c)));
    expect(bad).toEqual([]);
  });
});
