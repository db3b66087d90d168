import fc from 'fast-check';

// Hostile and near-valid sizing requests: the shapes a careless client, a spreadsheet export or an
// attacker would send. Near-valid ones reach deep into the engine; random ones test the edges.
const weirdNumber = fc.oneof(
  fc.double({ noNaN: false }),
  fc.constantFrom(0, -0, -1, 1e308, -1e308, 5e-324, Number.MAX_SAFE_INTEGER, 273.15, -273.15, -273.16, 1e-12),
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e999', '', ' ', '12,5', '0x10', '١٢'),
  fc.string(),
  fc.constant(null),
  fc.boolean(),
);
const unit = fc.oneof(
  fc.constantFrom('kg/h', 'degC', 'K', 'barg', 'psia', 'kPa', 'Nm3/h', 'SCFM', 'degF', 'bar', 'm3/h', 'lb/h'),
  fc.string(),
  fc.string({ unit: 'grapheme', maxLength: 8 }),
);
const quantity = fc.oneof(
  fc.record({ value: weirdNumber, unit }),
  weirdNumber,
  fc.constant({}),
  fc.array(weirdNumber, { maxLength: 3 }),
);
const gas = fc.oneof(
  fc.record({
    preset: fc.oneof(
      fc.constantFrom('air', 'nitrogen', 'methane', 'humid-air', 'hydrogen', 'oxygen', 'unobtainium'),
      fc.string(),
    ),
  }),
  fc.record(
    {
      components: fc.dictionary(
        fc.oneof(fc.constantFrom('CH4', 'N2', 'CO2', 'H2', 'O2', 'Ar'), fc.string({ maxLength: 6 })),
        weirdNumber,
        { maxKeys: 5 },
      ),
      basis: fc.constantFrom('mole', 'mass', 'volume'),
    },
    { requiredKeys: ['components'] },
  ),
  fc.record({ preset: fc.constant('humid-air'), relativeHumidityPercent: weirdNumber }),
  fc.jsonValue(),
);

export const nearValidRequest = fc.record(
  {
    service: fc.oneof(fc.constantFrom('heater', 'compressor'), fc.string()),
    gas,
    flow: quantity,
    inlet: fc.oneof(fc.record({ temperature: quantity, pressure: quantity }), fc.jsonValue()),
    outletTemperature: quantity,
    dischargePressure: quantity,
    isentropicEfficiency: weirdNumber,
    polytropicEfficiency: weirdNumber,
    stages: weirdNumber,
    heatLossPercent: weirdNumber,
    designMarginPercent: weirdNumber,
    intercoolerOutletTemperature: quantity,
    interstagePressureDropPercent: weirdNumber,
    method: fc.oneof(fc.constantFrom('constant-k', 'variable-cp'), fc.string()),
    supply: fc.oneof(fc.record({ voltageV: weirdNumber, phases: weirdNumber }), fc.jsonValue()),
    site: fc.oneof(fc.record({ altitudeM: weirdNumber }), fc.record({ barometricPressure: quantity })),
    k: weirdNumber,
    cpJPerKgK: weirdNumber,
  },
  { requiredKeys: [] },
);

const temp = (min: number, max: number) =>
  fc.record({ value: fc.double({ min, max, noNaN: true }), unit: fc.constantFrom('degC', 'K', 'degF') });
const plausibleGas = fc.oneof(
  fc.record({
    preset: fc.constantFrom(
      'air',
      'nitrogen',
      'methane',
      'hydrogen',
      'argon',
      'helium',
      'carbon-dioxide',
      'natural-gas',
    ),
  }),
  fc.record({
    components: fc.constantFrom({ CH4: 0.9, C2H6: 0.05, N2: 0.05 }, { N2: 0.79, O2: 0.21 }, { CH4: 0.6, CO2: 0.4 }),
  }),
);

/** Requests in or near the valid range, so the fuzz also drives the engine's arithmetic hard. */
export const plausibleRequest = fc.oneof(
  fc.record({
    service: fc.constant('heater'),
    gas: plausibleGas,
    flow: fc.record({
      value: fc.double({ min: 1e-6, max: 1e7, noNaN: true }),
      unit: fc.constantFrom('kg/h', 'Nm3/h', 'SCFM', 'lb/h', 'm3/h'),
    }),
    inlet: fc.record({
      temperature: temp(-100, 400),
      pressure: fc.record({
        value: fc.double({ min: 0.5, max: 5000, noNaN: true }),
        unit: fc.constantFrom('kPa', 'barg', 'psig', 'bar'),
      }),
    }),
    outletTemperature: temp(-50, 1500),
    heatLossPercent: fc.double({ min: 0, max: 60, noNaN: true }),
    designMarginPercent: fc.double({ min: 0, max: 120, noNaN: true }),
  }),
  fc.record({
    service: fc.constant('compressor'),
    gas: plausibleGas,
    flow: fc.record({
      value: fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
      unit: fc.constantFrom('kg/h', 'Nm3/h', 'SCFM'),
    }),
    inlet: fc.record({
      temperature: temp(-100, 200),
      pressure: fc.record({
        value: fc.double({ min: 0.5, max: 2000, noNaN: true }),
        unit: fc.constantFrom('kPa', 'bar', 'psia'),
      }),
    }),
    dischargePressure: fc.record({
      value: fc.double({ min: 0.5, max: 50000, noNaN: true }),
      unit: fc.constantFrom('kPa', 'bar', 'psia'),
    }),
    isentropicEfficiency: fc.double({ min: 0.01, max: 1, noNaN: true }),
    stages: fc.integer({ min: 1, max: 7 }),
    interstagePressureDropPercent: fc.double({ min: 0, max: 12, noNaN: true }),
    method: fc.constantFrom('constant-k', 'variable-cp'),
  }),
);

/** Deeply nested JSON, the kind that exhausts naive recursive validators. */
export const deepJson = fc.integer({ min: 50, max: 3000 }).map((depth) => '['.repeat(depth) + ']'.repeat(depth));

export const anyBody = fc.oneof(
  { weight: 4, arbitrary: plausibleRequest.map((v) => JSON.stringify(v)) },
  { weight: 4, arbitrary: nearValidRequest.map((v) => JSON.stringify(v)) },
  { weight: 2, arbitrary: fc.jsonValue().map((v) => JSON.stringify(v)) },
  { weight: 1, arbitrary: fc.string({ unit: 'grapheme', maxLength: 200 }) },
  { weight: 1, arbitrary: deepJson },
);

/** Every number anywhere in a value is finite (a NaN or Infinity would mean a broken figure). */
export function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}
