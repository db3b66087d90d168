/** A calculate request body for a simple heater duty, as the public API takes it; tests vary only what they need. */
export function heaterJson(
  o: {
    gas?: string;
    flowKgH?: number;
    inletC?: number;
    pressure?: { value: number; unit: string };
    outletC?: number;
  } = {},
): string {
  return JSON.stringify({
    service: 'heater',
    gas: { preset: o.gas ?? 'air' },
    flow: { value: o.flowKgH ?? 100, unit: 'kg/h' },
    inlet: {
      temperature: { value: o.inletC ?? 20, unit: 'degC' },
      pressure: o.pressure ?? { value: 101.325, unit: 'kPa' },
    },
    outletTemperature: { value: o.outletC ?? 80, unit: 'degC' },
  });
}
