import { batchColumns } from './columns';

export type BatchCells = Record<string, string>;
export type RowProblem = { column: string; message: string };

const numeric = new Set([
  'flow.value',
  'inlet.temperature.value',
  'inlet.pressure.value',
  'outletTemperature.value',
  'dischargePressure.value',
  'intercoolerOutletTemperature.value',
  'heatLossPercent',
  'designMarginPercent',
  'stages',
  'isentropicEfficiency',
  'polytropicEfficiency',
  'supply.voltageV',
  'supply.phases',
  'gas.relativeHumidityPercent',
]);

function setPath(target: Record<string, unknown>, path: string, value: unknown) {
  const parts = path.split('.');
  let node = target;
  for (const p of parts.slice(0, -1)) node = (node[p] ??= {}) as Record<string, unknown>;
  node[parts[parts.length - 1]!] = value;
}

/** Numbers as written in a spreadsheet: a decimal point, optional exponent; thousands separators are refused as ambiguous. */
function parseNumber(text: string): number | null {
  const t = text.trim();
  return /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t) ? Number(t) : null;
}

function parseGas(text: string, problems: RowProblem[]): Record<string, unknown> | undefined {
  const t = text.trim();
  if (!t) return undefined;
  if (!t.includes(':')) return { preset: t.toLowerCase() };
  const components: Record<string, number> = {};
  for (const part of t
    .split(/[;|]/)
    .map((p) => p.trim())
    .filter(Boolean)) {
    const [name, frac] = part.split(':').map((s) => s.trim());
    const n = parseNumber(frac ?? '');
    if (!name || n === null) problems.push({ column: 'gas', message: `"${part}" is not NAME:fraction (e.g. CH4:0.9)` });
    else components[name] = n;
  }
  return { components };
}

/** One CSV row as an engine request plus its save metadata; cell-level problems (text in a number) are reported here. */
export function rowToRequest(cells: BatchCells): {
  request: Record<string, unknown>;
  meta: { title: string; equipmentTag?: string; notes?: string };
  problems: RowProblem[];
} {
  const problems: RowProblem[] = [];
  const request: Record<string, unknown> = {};
  const meta: Record<string, unknown> = {};
  for (const col of batchColumns) {
    const raw = (cells[col.name] ?? '').trim();
    if (!raw || col.name === 'gas') continue;
    if (col.path.startsWith('meta.')) {
      meta[col.path.slice(5)] = raw;
      continue;
    }
    if (numeric.has(col.path)) {
      const n = parseNumber(raw);
      if (n === null) {
        problems.push({ column: col.name, message: `"${raw.slice(0, 40)}" is not a number` });
        continue;
      }
      setPath(request, col.path, n);
    } else {
      setPath(
        request,
        col.path,
        ['service', 'method', 'gas_basis', 'equation_of_state'].includes(col.name) ? raw.toLowerCase() : raw,
      );
    }
  }
  const gas = parseGas(cells.gas ?? '', problems);
  if (gas) request.gas = { ...((request.gas as object) ?? {}), ...gas };
  for (const unit of [
    'flow',
    'inlet_temperature',
    'inlet_pressure',
    'outlet_temperature',
    'discharge_pressure',
    'intercooler_outlet_temperature',
  ] as const) {
    const hasValue = (cells[`${unit}_value`] ?? '').trim() !== '';
    const hasUnit = (cells[`${unit}_unit`] ?? '').trim() !== '';
    if (hasValue && !hasUnit)
      problems.push({
        column: `${unit}_unit`,
        message: `give the unit for ${unit.replace(/_/g, ' ')} (the value ${cells[`${unit}_value`]} has none)`,
      });
  }
  return { request, meta: meta as { title: string; equipmentTag?: string; notes?: string }, problems };
}
