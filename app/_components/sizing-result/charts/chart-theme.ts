// Chart strokes from the Dutywise palette; every series also differs in dash or marker so a
// grey-scale print still tells them apart.
export const CHART = {
  ink: '#1c232b',
  muted: '#5c6773',
  grid: '#d9d3c7',
  copper: '#b4562b',
  tide: '#16565d',
  tideSoft: '#1d6a72',
  warning: '#a3430f',
  font: 12,
} as const;

export const axisTick = { fontSize: CHART.font, fill: CHART.muted };

/** Axis label props for recharts. */
export function axisLabel(value: string, axis: 'x' | 'y' | 'y2') {
  if (axis === 'x')
    return { value, position: 'insideBottom' as const, offset: -12, fontSize: CHART.font, fill: CHART.ink };
  return {
    value,
    angle: axis === 'y' ? -90 : 90,
    position: axis === 'y' ? ('insideLeft' as const) : ('insideRight' as const),
    fontSize: CHART.font,
    fill: CHART.ink,
    style: { textAnchor: 'middle' as const },
  };
}
