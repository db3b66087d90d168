// Invented duty points for datasheet tests, chosen so the engine's answer can also be held against
// published check values (see the source named beside each).
export const nitrogenHeater = {
  // N2, 1000 kg/h, 20 -> 300 °C absorbs 81.68 kW [calc from the NASA TM-4513 polynomials (McBride et al. 1993)].
  service: 'heater',
  gas: { preset: 'nitrogen' },
  flow: { value: 1000, unit: 'kg/h' },
  inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 2, unit: 'barg' } },
  outletTemperature: { value: 300, unit: 'degC' },
  heatLossPercent: 4,
  designMarginPercent: 15,
  supply: { voltageV: 400, phases: 3 },
  // The check value is the ideal-gas one; at 2 barg real nitrogen differs by about 0.2 %.
  equationOfState: 'ideal-gas',
};

export const airTwoStage = {
  // Air from 293.15 K, overall ratio 8, ideal stages with intercooling back to 293.15 K:
  // 203.8 kJ/kg in two stages with 101.9 kJ/kg intercooling [calc: w = cp T1 (r^((k-1)/k) - 1) per stage,
  // k 1.4 and cp 1.005 kJ/(kg K) for air from the standard thermodynamics texts [mem]].
  service: 'compressor',
  gas: { preset: 'air' },
  flow: { value: 900, unit: 'Nm3/h' },
  inlet: { temperature: { value: 293.15, unit: 'K' }, pressure: { value: 100, unit: 'kPa' } },
  dischargePressure: { value: 800, unit: 'kPa' },
  isentropicEfficiency: 1,
  stages: 2,
  intercoolerOutletTemperature: { value: 293.15, unit: 'K' },
  method: 'variable-cp',
  supply: { voltageV: 400, phases: 3 },
  equationOfState: 'ideal-gas',
};
