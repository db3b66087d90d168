import { KG_PER_LB, M3_PER_FT3, PA_PER_PSI, type UnitSystem } from '@/lib/units';

// The engine writes its warnings in SI. For a US customary user the figures in that text are restated in
// °F, psia/psig and lb/h on display, so the engine keeps one wording and every page shows the user's units.
// Only quantities written as "number unit" are touched; ranges such as "60-700 K" and unitless text stay.

const NUM = String.raw`(-?\d[\d,]*(?:\.\d+)?)`;
const sig = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 });

/** About four significant figures with thousands separators: 14.7, 5,512, 0.3125. */
function sig4(value: number): string {
  const text = sig.format(value);
  return text === '-0' ? '0' : text;
}

const read = (text: string) => Number(text.replace(/,/g, ''));
const decimals = (text: string) => text.split('.')[1]?.length ?? 0;

type Rule = { pattern: RegExp; replace: (value: string) => string };

const RULES: Rule[] = [
  // Temperatures keep the engine's decimals: "151.0 °C" → "303.8 °F".
  { pattern: new RegExp(`${NUM} °C`, 'g'), replace: (v) => `${(read(v) * 1.8 + 32).toFixed(decimals(v))} °F` },
  // A lone kelvin figure is a temperature difference; "a-b K" ranges are left alone.
  {
    pattern: new RegExp(String.raw`(?<![\d.\-])${NUM} K\b`, 'g'),
    replace: (v) => `${(read(v) * 1.8).toFixed(decimals(v))} °F`,
  },
  { pattern: new RegExp(`${NUM} bar gauge`, 'g'), replace: (v) => `${sig4((read(v) * 1e5) / PA_PER_PSI)} psig` },
  {
    pattern: new RegExp(`${NUM} kPa( abs(?:olute)?)?`, 'g'),
    replace: (v) => `${sig4((read(v) * 1e3) / PA_PER_PSI)} psia`,
  },
  {
    pattern: new RegExp(`${NUM} MPa( abs(?:olute)?)?`, 'g'),
    replace: (v) => `${sig4((read(v) * 1e6) / PA_PER_PSI)} psia`,
  },
  { pattern: new RegExp(`${NUM} kg/h`, 'g'), replace: (v) => `${sig4(read(v) / KG_PER_LB)} lb/h` },
  { pattern: new RegExp(`${NUM} kg/s`, 'g'), replace: (v) => `${sig4((read(v) * 3600) / KG_PER_LB)} lb/h` },
  {
    pattern: new RegExp(`${NUM} kg/m3`, 'g'),
    replace: (v) => `${sig4((read(v) * M3_PER_FT3) / KG_PER_LB)} lb/ft³`,
  },
];

/** An engine message with its SI figures restated in the user's unit system (unchanged for SI). */
export function localiseText(message: string, system: UnitSystem): string {
  if (system === 'si') return message;
  return RULES.reduce((text, rule) => text.replace(rule.pattern, (_m, v: string) => rule.replace(v)), message);
}
