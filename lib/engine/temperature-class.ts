/** Maximum surface temperature per temperature class, °C [pub: IEC 60079-0]. */
export const TEMPERATURE_CLASSES: readonly { name: string; maxSurfaceC: number }[] = [
  { name: 'T6', maxSurfaceC: 85 },
  { name: 'T5', maxSurfaceC: 100 },
  { name: 'T4', maxSurfaceC: 135 },
  { name: 'T3', maxSurfaceC: 200 },
  { name: 'T2', maxSurfaceC: 300 },
  { name: 'T1', maxSurfaceC: 450 },
];

/** The most restrictive class whose limit a surface at `surfaceC` still meets, or null above T1. */
export function bestTemperatureClass(surfaceC: number): { name: string; maxSurfaceC: number } | null {
  for (const cls of TEMPERATURE_CLASSES) if (surfaceC <= cls.maxSurfaceC) return cls;
  return null;
}
