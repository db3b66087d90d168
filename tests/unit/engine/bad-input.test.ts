import { describe, expect, it } from 'vitest';
import { SizingInputError, calculate, type CompressorResult, type SizingIssue } from '@/lib/engine';
import { compressorRequest, heaterRequest, q } from './requests';

function issuesOf(input: unknown): SizingIssue[] {
  try {
    calculate(input);
  } catch (err) {
    if (err instanceof SizingInputError) return err.issues;
    throw err;
  }
  throw new Error('expected the input to be refused');
}

const paths = (input: unknown) => issuesOf(input).map((i) => i.path);

describe('refused input names the field, why, and the allowed range', () => {
  it('negative flow', () => {
    expect(issuesOf(heaterRequest({ flow: q(-5, 'kg/h') }))).toEqual([
      { path: 'flow.value', message: expect.stringMatching(/above 0/) },
    ]);
  });

  it('temperature below absolute zero', () => {
    expect(issuesOf(heaterRequest({ outletTemperature: q(-500, 'degF') }))).toEqual([
      { path: 'outletTemperature', message: expect.stringMatching(/absolute zero/) },
    ]);
  });

  it('temperature outside the 200-6000 K property data, with the range in the user unit', () => {
    const [issue] = issuesOf(heaterRequest({ inlet: { temperature: q(-100, 'degC'), pressure: q(1, 'bar') } }));
    expect(issue).toEqual({
      path: 'inlet.temperature',
      message: expect.stringMatching(/-73\.15 degC to 5726\.85 degC/),
    });
    expect(paths(heaterRequest({ outletTemperature: q(6500, 'K') }))).toEqual(['outletTemperature']);
  });

  it('heater outlet not above inlet', () => {
    expect(issuesOf(heaterRequest({ outletTemperature: q(10, 'degC') }))).toEqual([
      { path: 'outletTemperature', message: expect.stringMatching(/above the inlet/) },
    ]);
  });

  it('discharge not above suction, including gauge against the site pressure', () => {
    expect(paths(compressorRequest({ dischargePressure: q(100, 'kPa') }))).toEqual(['dischargePressure']);
    // 0 barg at a 1000 m site is 89.9 kPa: below a 100 kPa suction.
    expect(paths(compressorRequest({ dischargePressure: q(0, 'barg'), site: { altitudeM: 1000 } }))).toEqual([
      'dischargePressure',
    ]);
  });

  it.each([0, 0.001, 0.29, -0.1, 1.01, 80, 'x'])('efficiency %s outside [0.3, 1], blamed on the efficiency', (eta) => {
    const [issue] = issuesOf(compressorRequest({ isentropicEfficiency: eta }));
    expect(issue!.path).toBe('isentropicEfficiency');
    expect(issue!.message).toMatch(/from 0\.3 to 1/);
  });

  it('a polytropic or mechanical efficiency out of range names its own field', () => {
    const poly = issuesOf(compressorRequest({ isentropicEfficiency: undefined, polytropicEfficiency: 0.05 }));
    expect(poly.map((i) => i.path)).toEqual(['polytropicEfficiency']);
    expect(paths(compressorRequest({ mechanicalEfficiency: 0.4 }))).toEqual(['mechanicalEfficiency']);
  });

  it('a discharge-temperature limit outside 40-350 °C, or below the suction temperature, is refused on that field', () => {
    expect(paths(compressorRequest({ dischargeTemperatureLimit: q(20, 'degC') }))).toEqual([
      'dischargeTemperatureLimit',
    ]);
    expect(paths(compressorRequest({ dischargeTemperatureLimit: q(900, 'degC') }))).toEqual([
      'dischargeTemperatureLimit',
    ]);
    const hotSuction = { temperature: q(90, 'degC'), pressure: q(100, 'kPa') };
    expect(paths(compressorRequest({ inlet: hotSuction, dischargeTemperatureLimit: q(80, 'degC') }))).toEqual([
      'dischargeTemperatureLimit',
    ]);
  });

  it('both or neither efficiency', () => {
    expect(paths(compressorRequest({ polytropicEfficiency: 0.8 }))).toEqual(['polytropicEfficiency']);
    expect(paths(compressorRequest({ isentropicEfficiency: undefined }))).toEqual(['isentropicEfficiency']);
  });

  it('fractions that do not sum to 1', () => {
    expect(issuesOf(heaterRequest({ gas: { components: { CH4: 0.9, N2: 0.05 } } }))).toEqual([
      { path: 'gas.components', message: expect.stringMatching(/sum to 0\.95.*within 0\.0001/) },
    ]);
  });

  it('unknown gas preset and unknown species', () => {
    expect(issuesOf(heaterRequest({ gas: { preset: 'unobtainium' } }))[0]).toMatchObject({
      path: 'gas.preset',
      message: expect.stringMatching(/allowed: air/),
    });
    expect(paths(heaterRequest({ gas: { components: { CH4: 0.5, Kr: 0.5 } } }))).toEqual(['gas.components.Kr']);
  });

  it('humid air without humidity, or with both', () => {
    expect(paths(heaterRequest({ gas: { preset: 'humid-air' } }))).toEqual(['gas.relativeHumidityPercent']);
    expect(
      paths(heaterRequest({ gas: { preset: 'humid-air', relativeHumidityPercent: 50, dewPoint: q(5, 'degC') } })),
    ).toEqual(['gas.relativeHumidityPercent']);
    expect(paths(heaterRequest({ gas: { preset: 'air', relativeHumidityPercent: 50 } }))).toEqual([
      'gas.relativeHumidityPercent',
    ]);
  });

  it('NaN, Infinity and empty text are refused; numeric text is accepted', () => {
    for (const bad of ['', '  ', 'NaN', 'Infinity', '1e400', '0x10', '12abc', null, true]) {
      expect(paths(heaterRequest({ heatLossPercent: bad }))).toEqual(['heatLossPercent']);
    }
    expect(() => calculate(heaterRequest({ heatLossPercent: ' 7.5 ', flow: q('2000', 'kg/h') }))).not.toThrow();
  });

  it('unknown units and unknown fields', () => {
    expect(paths(heaterRequest({ flow: q(1, 'kg/hr') }))).toEqual(['flow.unit']);
    expect(paths(heaterRequest({ heatlossPercent: 5 }))).toEqual(['heatlossPercent']);
    expect(paths(heaterRequest({ flow: { value: 1, unit: 'kg/h', basis: 'x' } }))).toEqual(['flow.basis']);
    expect(paths(heaterRequest({ dischargePressure: q(5, 'bar') }))).toEqual(['dischargePressure']);
  });

  it('lists every bad field at once', () => {
    const found = paths(
      heaterRequest({
        flow: q(0, 'kg/h'),
        heatLossPercent: 90,
        designMarginPercent: -1,
        supply: { voltageV: 5, phases: 2 },
      }),
    );
    expect(found.sort()).toEqual([
      'designMarginPercent',
      'flow.value',
      'heatLossPercent',
      'supply.phases',
      'supply.voltageV',
    ]);
  });

  it('absolute pressure must be above vacuum, also when given as gauge', () => {
    expect(
      issuesOf(heaterRequest({ inlet: { temperature: q(20, 'degC'), pressure: q(-1.5, 'barg') } }))[0],
    ).toMatchObject({ path: 'inlet.pressure', message: expect.stringMatching(/above 0 kPa absolute/) });
  });

  it('site gives barometric pressure or altitude, not both, within range', () => {
    expect(paths(heaterRequest({ site: { altitudeM: 500, barometricPressure: q(95, 'kPa') } }))).toEqual([
      'site.altitudeM',
    ]);
    expect(paths(heaterRequest({ site: { altitudeM: 9000 } }))).toEqual(['site.altitudeM']);
    expect(paths(heaterRequest({ site: { barometricPressure: q(5, 'barg') } }))).toEqual([
      'site.barometricPressure.unit',
    ]);
  });

  it('service and body shape', () => {
    expect(issuesOf({ service: 'pump' })).toEqual([
      { path: 'service', message: expect.stringMatching(/heater.*compressor/) },
    ]);
    expect(paths(null)).toEqual(['']);
    expect(paths([1, 2])).toEqual(['']);
  });

  it('stages must be a whole number from 1 to 6', () => {
    for (const n of [0, 7, 2.5]) expect(paths(compressorRequest({ stages: n }))).toEqual(['stages']);
  });

  it('k override must be in (1, 1.8] and cp above R', () => {
    expect(paths(compressorRequest({ k: 1 }))).toEqual(['k']);
    expect(paths(compressorRequest({ cpJPerKgK: 200 }))).toEqual(['cpJPerKgK']);
  });

  // Ideal gas: cp - cv = R, so k = cp/(cp - R). For air (R 287.05 J/(kg K)) k <= 1.8 needs cp >= 2.25 R = 645.9.
  it('a cp override may not imply k above 1.8', () => {
    const low = issuesOf(compressorRequest({ cpJPerKgK: 300 }));
    expect(low).toEqual([
      {
        path: 'cpJPerKgK',
        message: expect.stringMatching(/at least 645\.\d J\/\(kg K\).*k = cp\/\(cp - R\) above 1\.8/),
      },
    ]);
    expect(paths(compressorRequest({ cpJPerKgK: 640 }))).toEqual(['cpJPerKgK']);
    expect(
      (calculate(compressorRequest({ cpJPerKgK: 650 })) as CompressorResult).compressor.constantK.stages[0]?.k,
    ).toBeCloseTo(650 / (650 - 287.05), 2);
  });

  // Air table figures cp 1.005 kJ/(kg K), k 1.400 (standard thermodynamics texts [mem]) agree with R to 0.03 %.
  it('k and cp given together must agree with the gas constant', () => {
    expect(
      (calculate(compressorRequest({ k: 1.4, cpJPerKgK: 1005 })) as CompressorResult).compressor.constantK.stages[0]?.k,
    ).toBe(1.4);
    const clash = issuesOf(compressorRequest({ k: 1.667, cpJPerKgK: 1005 }));
    expect(clash).toEqual([
      { path: 'cpJPerKgK', message: expect.stringMatching(/imply R = .* 402\.1 J\/\(kg K\).*R = 287\.05/) },
    ]);
  });
});
