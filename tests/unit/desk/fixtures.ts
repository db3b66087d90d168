import type { SizingRequest } from '@/lib/engine';

// Duty points used across the desk tests: invented enquiries, not any customer's.
export const heaterRequest: Extract<SizingRequest, { service: 'heater' }> = {
  service: 'heater',
  gas: { preset: 'air' },
  flow: { value: 2, unit: 't/h' },
  inlet: { temperature: { value: 15, unit: 'degC' }, pressure: { value: 3, unit: 'barg' } },
  outletTemperature: { value: 320, unit: 'degC' },
  heatLossPercent: 5,
  designMarginPercent: 10,
  supply: { voltageV: 400, phases: 3 },
};

export const compressorRequest: Extract<SizingRequest, { service: 'compressor' }> = {
  service: 'compressor',
  gas: { components: { CH4: 0.9, C2H6: 0.05, N2: 0.05 } },
  flow: { value: 1500, unit: 'Nm3/h' },
  inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 1, unit: 'bar' } },
  dischargePressure: { value: 30, unit: 'bar' },
  stages: 3,
  polytropicEfficiency: 0.82,
  intercoolerOutletTemperature: { value: 40, unit: 'degC' },
  interstagePressureDropPercent: 1,
  supply: { voltageV: 690, phases: 3 },
};
