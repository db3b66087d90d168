// Engine keys carry their unit as a camelCase suffix (dutyKw, massFlowKgPerS, temperatureK);
// the table shows the words and the unit apart so a practitioner reads "Design duty (kW)".
const UNIT_SUFFIXES: [string, string][] = [
  ['KgPerS', 'kg/s'],
  ['KgPerH', 'kg/h'],
  ['KjPerKgK', 'kJ/(kg·K)'],
  ['JPerKgK', 'J/(kg·K)'],
  ['JPerMolK', 'J/(mol·K)'],
  ['KjPerKg', 'kJ/kg'],
  ['JPerKg', 'J/kg'],
  ['KgPerKmol', 'kg/kmol'],
  ['KgPerM3', 'kg/m³'],
  ['M3PerS', 'm³/s'],
  ['M3PerH', 'm³/h'],
  ['Nm3PerH', 'Nm³/h'],
  ['WPerM2', 'W/m²'],
  ['Percent', '%'],
  ['Kpa', 'kPa'],
  ['Pa', 'Pa'],
  ['Bar', 'bar'],
  ['Kw', 'kW'],
  ['Mw', 'MW'],
  ['Hp', 'hp'],
  ['Kj', 'kJ'],
  ['Degc', '°C'],
  ['C', '°C'],
  ['K', 'K'],
  ['V', 'V'],
  ['A', 'A'],
  ['W', 'W'],
  ['M', 'm'],
  ['S', 's'],
];

const ACRONYMS = new Set(['rh', 'id', 'api', 'iec', 'nec', 'iso', 'nasa']);

/** "designDutyKw" → { label: "Design duty", unit: "kW" }; unknown shapes pass through readably. */
export function readableKey(key: string): { label: string; unit: string | null } {
  let base = key;
  let unit: string | null = null;
  for (const [suffix, u] of UNIT_SUFFIXES) {
    // Only a suffix after a lower-case letter or digit is a unit (so "K" alone stays a key, "totalK" is kelvin).
    if (
      key.length > suffix.length &&
      key.endsWith(suffix) &&
      /[a-z0-9]/.test(key.charAt(key.length - suffix.length - 1))
    ) {
      base = key.slice(0, -suffix.length);
      unit = u;
      break;
    }
  }
  const words = base
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[_-]+/g, ' ')
    .trim()
    .split(/\s+/)
    .map((w) => (ACRONYMS.has(w.toLowerCase()) ? w.toUpperCase() : w.toLowerCase()));
  const label = words.join(' ');
  return { label: label.charAt(0).toUpperCase() + label.slice(1), unit };
}
