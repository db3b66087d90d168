import { describe, expect, it } from 'vitest';
import { calculate, type SizingResult } from '@/lib/engine';
import { compressorRequest, heaterRequest, q } from './requests';

const codes = (r: SizingResult) => r.warnings.map((w) => w.code);
const find = (r: SizingResult, code: string) => r.warnings.find((w) => w.code === code);

describe('warnings as data', () => {
  it('always carry the preliminary note, last', () => {
    for (const r of [calculate(heaterRequest()), calculate(compressorRequest())]) {
      expect(r.warnings.at(-1)).toMatchObject({
        code: 'preliminary',
        message: expect.stringMatching(/qualified engineer.*local codes/),
      });
      for (const w of r.warnings) expect(['info', 'caution', 'warning', 'danger']).toContain(w.severity);
    }
  });

  it('average-cp beyond a 200 K rise', () => {
    expect(codes(calculate(heaterRequest({ outletTemperature: q(250, 'degC') })))).toContain('average-cp-range');
    expect(codes(calculate(heaterRequest({ outletTemperature: q(200, 'degC') })))).not.toContain('average-cp-range');
  });

  it('flammable gas, and the temperature class it can meet [pub: IEC 60079-0: T3 is 200 °C]', () => {
    const r = calculate(heaterRequest({ gas: { preset: 'natural-gas' }, outletTemperature: q(180, 'degC') }));
    expect(find(r, 'flammable-gas')?.severity).toBe('danger');
    expect(find(r, 'temperature-class')?.message).toMatch(/T3 \(200 °C/);
    const hot = calculate(heaterRequest({ gas: { preset: 'methane' }, outletTemperature: q(500, 'degC') }));
    expect(find(hot, 'temperature-class')?.severity).toBe('danger');
  });

  it('oxygen service and fuel-oxidant mixtures', () => {
    expect(find(calculate(heaterRequest({ gas: { preset: 'oxygen' } })), 'oxygen-service')?.severity).toBe('danger');
    expect(codes(calculate(heaterRequest()))).not.toContain('oxygen-service');
    expect(codes(calculate(heaterRequest({ gas: { components: { CH4: 0.5, O2: 0.5 } } })))).toContain(
      'fuel-oxidant-mixture',
    );
  });

  it('hydrogen, and its lower default discharge limit of 135 °C [mem: API 618]', () => {
    const r = calculate(compressorRequest({ gas: { preset: 'hydrogen' } }));
    expect(codes(r)).toContain('hydrogen');
    expect(r.service === 'compressor' && r.compressor.dischargeTemperatureLimitC).toBeCloseTo(135, 9);
  });

  it('high discharge temperature and high ratio per stage', () => {
    const r = calculate(compressorRequest({ dischargePressure: q(1200, 'kPa'), isentropicEfficiency: 0.75 }));
    expect(find(r, 'high-discharge-temperature')?.message).toMatch(/stages would meet it/);
    expect(codes(r)).toContain('high-stage-ratio');
    expect(codes(calculate(compressorRequest({ dischargePressure: q(300, 'kPa') })))).not.toContain(
      'high-discharge-temperature',
    );
  });

  it("ideal gas doubtful near the CO2 critical point, not for air at 1 atm [Kay's rule, Tc/Pc from standard tables]", () => {
    const co2 = calculate(
      heaterRequest({
        gas: { preset: 'carbon-dioxide' },
        inlet: { temperature: q(35, 'degC'), pressure: q(70, 'bar') },
        outletTemperature: q(60, 'degC'),
      }),
    );
    expect(find(co2, 'ideal-gas-doubtful')?.severity).toBe('warning');
    expect(codes(calculate(heaterRequest()))).not.toContain('ideal-gas-doubtful');
    const ng = calculate(
      compressorRequest({
        gas: { preset: 'natural-gas' },
        dischargePressure: q(40, 'bar'),
        stages: 3,
        isentropicEfficiency: 0.8,
      }),
    );
    expect(codes(ng)).toContain('ideal-gas-doubtful');
  });

  it('condensation when steam or humid air reaches saturation', () => {
    const steam = calculate(
      heaterRequest({
        gas: { preset: 'steam' },
        inlet: { temperature: q(100, 'degC'), pressure: q(2, 'bar') },
        outletTemperature: q(200, 'degC'),
      }),
    );
    expect(find(steam, 'condensation')?.message).toMatch(/heater inlet/);
    const wet = calculate(
      compressorRequest({
        gas: { preset: 'humid-air', relativeHumidityPercent: 80 },
        inlet: { temperature: q(30, 'degC'), pressure: q(1, 'bar') },
        dischargePressure: q(8, 'bar'),
        stages: 2,
        intercoolerOutletTemperature: q(35, 'degC'),
        isentropicEfficiency: 0.8,
      }),
    );
    expect(find(wet, 'condensation')?.message).toMatch(/stage 2 inlet/);
  });

  it('heater safety controls and hot surfaces on every heater', () => {
    const r = calculate(heaterRequest());
    expect(codes(r)).toEqual(
      expect.arrayContaining(['heater-safety-controls', 'hot-surface', 'temperature-class', 'supply-voltage']),
    );
  });
});
