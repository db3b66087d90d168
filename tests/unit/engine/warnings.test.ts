import { describe, expect, it } from 'vitest';
import { calculate, type SizingResult } from '@/lib/engine';
import { saturationPressureWagnerPrussPa } from '@/lib/thermo/water-saturation';
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

  // Validity is judged by the figures: ideal gas is flagged when it moves the duty or power by more than 2 %.
  // The sizes of the effects are [calc] against reference equations of state: natural gas 20 -> 80 bar about
  // +4 to +6 % in power, a nitrogen heater at 70 bar about -6 % in duty.
  it('flags ideal gas where it moves the duty or the power by more than 2 %, not for air at 1 atm', () => {
    const n2 = calculate(
      heaterRequest({
        gas: { preset: 'nitrogen' },
        inlet: { temperature: q(20, 'degC'), pressure: q(70, 'bar') },
        outletTemperature: q(150, 'degC'),
        equationOfState: 'gerg-2008',
      }),
    );
    expect(find(n2, 'real-gas-effect')?.message).toMatch(
      /understates the absorbed duty by [5-8]\.\d %; the headline figures use GERG-2008/,
    );
    expect(codes(calculate(heaterRequest()))).not.toContain('real-gas-effect');
    expect(codes(calculate(heaterRequest({ equationOfState: undefined })))).not.toContain('real-gas-effect');
    const ngRequest = compressorRequest({
      gas: { components: { CH4: 0.9, C2H6: 0.05, C3H8: 0.02, N2: 0.02, CO2: 0.01 } },
      inlet: { temperature: q(25, 'degC'), pressure: q(20, 'bar') },
      dischargePressure: q(80, 'bar'),
      stages: 2,
      isentropicEfficiency: 0.78,
    });
    // Asked for ideal gas, the sizing still says what a real-gas equation would change.
    expect(find(calculate(ngRequest), 'real-gas-effect')?.message).toMatch(
      /Sized on ideal gas as asked.*overstates the gas power by [3-8]\.\d %/,
    );
  });

  it('refuses a liquid inlet: water at 100 °C and 2 bar is below its boiling point [pub: steam tables, p_sat(100 °C) = 101.3 kPa]', () => {
    expect(() =>
      calculate(
        heaterRequest({
          gas: { preset: 'steam' },
          inlet: { temperature: q(100, 'degC'), pressure: q(2, 'bar') },
          outletTemperature: q(200, 'degC'),
        }),
      ),
    ).toThrow(/inlet\.pressure: water vapour at 100\.0 °C is liquid above/);
  });

  // Humid air compressed and intercooled drops water. Check against the simple saturation estimate: the vapour
  // leaving holds y = p_sat(T)/p [pub: Wagner & Pruss, J. Phys. Chem. Ref. Data 31 (2002) 387, vapour pressure],
  // and the latent heat is near h_fg(35 °C) = 2418 kJ/kg [mem: IAPWS-IF97 steam tables]. Peng-Robinson's water
  // vapour pressure runs low at these temperatures, so the condensate agrees within about 25 %.
  it('an intercooler below the dew point condenses water, with its latent heat in the duty', () => {
    const wet = calculate(
      compressorRequest({
        gas: { preset: 'humid-air', relativeHumidityPercent: 80 },
        inlet: { temperature: q(30, 'degC'), pressure: q(1, 'bar') },
        dischargePressure: q(8, 'bar'),
        stages: 2,
        intercoolerOutletTemperature: q(35, 'degC'),
        isentropicEfficiency: 0.8,
        equationOfState: undefined,
      }),
    );
    if (wet.service !== 'compressor') throw new Error('expected a compressor');
    const cooler = wet.compressor.realGas!.stages[0]!.cooler!;
    const xw = wet.gas.moleFractions.H2O!;
    const p = cooler.outletPressureKpa * 1000;
    const yw = saturationPressureWagnerPrussPa(308.15) / p;
    const feedKmolPerS = wet.massFlowKgPerS / wet.molarMassKgPerKmol;
    const condensedKgPerH = feedKmolPerS * (xw - (yw * (1 - xw)) / (1 - yw)) * 18.015 * 3600;
    expect(Math.abs(cooler.condensateKgPerH / condensedKgPerH - 1)).toBeLessThan(0.25);
    expect(Math.abs(cooler.latentDutyKw / ((cooler.condensateKgPerH / 3600) * 2418) - 1)).toBeLessThan(0.1);
    expect(find(wet, 'cooler-condensate')?.message).toMatch(/intercooler after stage 1 condenses/);
    // The second stage takes the drier vapour only.
    expect(wet.compressor.realGas!.stages[1]!.massFlowKgPerS).toBeLessThan(wet.massFlowKgPerS);
  });

  it('heater safety controls and hot surfaces on every heater', () => {
    const r = calculate(heaterRequest());
    expect(codes(r)).toEqual(
      expect.arrayContaining(['heater-safety-controls', 'hot-surface', 'temperature-class', 'supply-voltage']),
    );
  });
});

describe('drive supply', () => {
  // Above about 400 kW a low-voltage motor's current is impractical; medium voltage is the norm [cp].
  it('suggests a medium-voltage supply for a large motor on a low-voltage supply, not for a small one', () => {
    const big = compressorRequest({
      flow: q(10, 'kg/s'),
      isentropicEfficiency: 0.8,
      supply: { voltageV: 480, phases: 3 },
    });
    const large = calculate(big);
    expect(find(large, 'medium-voltage-drive')?.message).toMatch(/kW motor at 480 V would draw about \d+ A/);
    expect(codes(calculate({ ...big, supply: { voltageV: 6600, phases: 3 } }))).not.toContain('medium-voltage-drive');
    expect(codes(calculate({ ...big, flow: q(0.5, 'kg/s') }))).not.toContain('medium-voltage-drive');
  });
});
