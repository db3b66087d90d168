import { ENGINE_VERSION, type SizingResult } from '@/lib/engine';
import { findPreset } from '@/lib/thermo';

/** A validated input with the engine's answer to it, as saved together. */
export type Computed = { input: unknown; result: SizingResult };

// Gas names for lists and search, in words: the preset's name ("Air (dry)"), or the mixture's main components.
export function gasKeyAndLabel(gas: unknown): { key: string; label: string } {
  const g = (gas ?? {}) as { preset?: unknown; components?: unknown; relativeHumidityPercent?: unknown };
  if (typeof g.preset === 'string') {
    const rh = typeof g.relativeHumidityPercent === 'number' ? `, ${g.relativeHumidityPercent} % RH` : '';
    const name = findPreset(g.preset)?.displayName ?? g.preset.replace(/-/g, ' ');
    return { key: g.preset, label: `${name}${rh}` };
  }
  if (g.components && typeof g.components === 'object') {
    const parts = Object.entries(g.components as Record<string, number>)
      .filter(([, v]) => typeof v === 'number' && v > 0)
      .sort((a, b) => b[1] - a[1])
      .slice(0, 4)
      .map(([k, v]) => `${k} ${(v * 100).toFixed(v < 0.1 ? 1 : 0)} %`);
    return { key: 'mixture', label: `Mixture: ${parts.join(', ')}` };
  }
  return { key: 'unknown', label: 'Not recorded' };
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
