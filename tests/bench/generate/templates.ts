// Duty templates for the generated sizings: real engine answers for a spread of heater and compressor
// requests. The database copies them onto millions of rows, so the engine runs only once per template.
import { calculate } from '@/lib/engine';

const gases = ['air', 'nitrogen', 'methane', 'carbon-dioxide', 'hydrogen', 'argon', 'natural-gas', 'oxygen'];

export type Template = {
  service: 'heater' | 'compressor';
  gas: string;
  input: string;
  result: string;
  headlineKw: number;
  massFlowKgPerS: number;
};

// Deterministic pseudo-random numbers so two runs make the same database.
function lcg(seed: number) {
  let s = seed;
  return () => (s = (s * 1103515245 + 12345) % 2147483648) / 2147483648;
}

function request(rnd: () => number) {
  const service = rnd() < 0.6 ? 'heater' : 'compressor';
  const gas = gases[Math.floor(rnd() * gases.length)]!;
  const flow = Math.round(50 + rnd() * 20_000);
  const input =
    service === 'heater'
      ? {
          service,
          gas: { preset: gas },
          flow: { value: flow, unit: 'kg/h' },
          inlet: {
            temperature: { value: Math.round(rnd() * 40), unit: 'degC' },
            pressure: { value: 100 + Math.round(rnd() * 900), unit: 'kPa' },
          },
          outletTemperature: { value: 60 + Math.round(rnd() * 500), unit: 'degC' },
          heatLossPercent: 5,
          designMarginPercent: 10,
        }
      : {
          service,
          gas: { preset: gas },
          flow: { value: flow, unit: 'Nm3/h' },
          inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 1, unit: 'bar' } },
          dischargePressure: { value: 2 + Math.round(rnd() * 40), unit: 'bar' },
          isentropicEfficiency: Math.round((0.75 + rnd() * 0.1) * 1000) / 1000,
          stages: 1 + Math.floor(rnd() * 4),
        };
  return { service, gas, input } as const;
}

/** `count` sized duties; requests the engine refuses are skipped, so a few fewer may come back. */
export function makeTemplates(count: number): Template[] {
  const rnd = lcg(20261201);
  const out: Template[] = [];
  for (let i = 0; i < count; i++) {
    const { service, gas, input } = request(rnd);
    let res;
    try {
      res = calculate(input);
    } catch {
      continue;
    }
    const kw = res.service === 'heater' ? res.heater.designDutyKw : res.compressor.shaftPowerKw;
    out.push({
      service,
      gas,
      input: JSON.stringify(input),
      // A compact result keeps millions of rows to a few GB; the look-up reads the scalar columns.
      result: JSON.stringify({ service, massFlowKgPerS: res.massFlowKgPerS, headlineKw: kw, generated: true }),
      headlineKw: kw,
      massFlowKgPerS: res.massFlowKgPerS,
    });
  }
  return out;
}
