// Short gas names for lists and search: the preset's key, or the mixture's main components.
export function gasKeyAndLabel(gas: unknown): { key: string; label: string } {
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
