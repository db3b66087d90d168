import { ENGINE_VERSION, type SizingResult } from '@/lib/engine';

/** A validated input with the engine's answer to it, as saved together. */
export type Computed = { input: unknown; result: SizingResult };

// Short gas names for lists and search: the preset's key, or the mixture's main components.
function gasKeyAndLabel(gas: unknown): { key: string; label: string } {
  const g = (gas ?? {}) as { preset?: unknown; components?: unknown; relativeHumidityPercent?: unknown };
  if (typeof g.preset === 'string') {
    const rh = typeof g.relativeHumidityPercent === 'number' ? ` ${g.relativeHumidityPercent}% RH` : '';
    return { key: g.preset, label: `${g.preset.replace(/-/g, ' ')}${rh}` };
  }
  if (g.components && typeof g.components === 'object') {
    const parts = Object.entries(g.components as Record<string, number>)
      .filter(([, v]) => typeof v === 'number' && v > 0)
      .sort((a, b) => b[1] - a[1])
      .slice(0, 4)
      .map(([k, v]) => `${k} ${(v * 100).toFixed(v < 0.1 ? 1 : 0)}%`);
    return { key: 'mixture', label: `mixture: ${parts.join(', ')}` };
  }
  return { key: 'unknown', label: 'unknown' };
}

/** The engine's answer reduced to the scalar columns that lists, filters and search use. */
export function headlineOf(result: SizingResult): number {
  return result.service === 'heater' ? result.heater.designDutyKw : result.compressor.shaftPowerKw;
}

/** The gas key and label, engine version and headline columns stored beside a computed input. */
export function computedColumns(computed: Computed) {
  const gas = gasKeyAndLabel((computed.input as { gas?: unknown }).gas);
  return {
    service: computed.result.service,
    gasKey: gas.key,
    gasLabel: gas.label,
    input: computed.input,
    result: computed.result,
    engineVersion: ENGINE_VERSION,
    headlineKw: headlineOf(computed.result),
    massFlowKgPerS: computed.result.massFlowKgPerS,
  };
}
