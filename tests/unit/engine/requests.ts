// Request builders for the sizing tests: a valid base request per service, overridden per case. They ask for
// the ideal gas, which is what the ideal-gas check values in these tests describe; real-gas tests override it.
export const q = (value: number | string, unit: string) => ({ value, unit });

export function heaterRequest(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    service: 'heater',
    gas: { preset: 'air' },
    flow: q(2000, 'kg/h'),
    inlet: { temperature: q(20, 'degC'), pressure: q(101.325, 'kPa') },
    outletTemperature: q(350, 'degC'),
    heatLossPercent: 5,
    designMarginPercent: 10,
    equationOfState: 'ideal-gas',
    ...overrides,
  };
}

export function compressorRequest(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    service: 'compressor',
    gas: { preset: 'air' },
    flow: q(1, 'kg/s'),
    inlet: { temperature: q(293.15, 'K'), pressure: q(100, 'kPa') },
    dischargePressure: q(800, 'kPa'),
    isentropicEfficiency: 1,
    equationOfState: 'ideal-gas',
    ...overrides,
  };
}
