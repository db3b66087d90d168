import fc from 'fast-check';
import psychrolib from 'psychrolib';
import { describe, expect, it } from 'vitest';
import { presetGas } from '@/lib/thermo';
import {
  DEFAULT_HEATER_RATINGS_KW,
  absorbedDutyKw,
  calculate,
  sizeHeater,
  type HeaterCase,
  type HeaterResult,
} from '@/lib/engine';
import { heaterRequest, q } from './requests';

const heater = (overrides: Record<string, unknown> = {}) => calculate(heaterRequest(overrides)) as HeaterResult;

describe('heater duty', () => {
  // N2, 1000 kg/h, 20 -> 300 °C: 81.68 kW [calc from the NASA TM-4513 polynomials (McBride et al. 1993)].
  it('nitrogen 1000 kg/h from 20 to 300 °C absorbs 81.68 kW', () => {
    const r = heater({ gas: { preset: 'nitrogen' }, flow: q(1000, 'kg/h'), outletTemperature: q(300, 'degC') });
    expect(r.heater.absorbedDutyKw).toBeCloseTo(81.68, 2);
    expect(r.massFlowKgPerS).toBeCloseTo(1000 / 3600, 12);
  });

  // Air tables: h(1000 K) - h(300 K) = 745.85 kJ/kg [mem: ideal-gas air tables].
  it('air 1 kg/s from 300 to 1000 K absorbs 745.85 kW within 0.1 %', () => {
    const r = heater({
      flow: q(1, 'kg/s'),
      inlet: { temperature: q(300, 'K'), pressure: q(1, 'bar') },
      outletTemperature: q(1000, 'K'),
    });
    expect(Math.abs(r.heater.absorbedDutyKw / 745.85 - 1)).toBeLessThan(1e-3);
  });

  // Humid air: ASHRAE moist-air enthalpy h = 1.006 t + W (2501 + 1.86 t) kJ/kg dry air [pub: ASHRAE HoF 2017 ch. 1 eq. 32, via psychrolib].
  it('humid air heating duty agrees with the ASHRAE moist-air enthalpy within 0.5 %', () => {
    psychrolib.SetUnitSystem(psychrolib.SI);
    const r = heater({
      gas: { preset: 'humid-air', relativeHumidityPercent: 70 },
      inlet: { temperature: q(25, 'degC'), pressure: q(101.325, 'kPa') },
      outletTemperature: q(95, 'degC'),
      flow: q(1, 'kg/s'),
    });
    const w = psychrolib.GetHumRatioFromRelHum(25, 0.7, 101_325);
    const dhPerKgDry = (psychrolib.GetMoistAirEnthalpy(95, w) - psychrolib.GetMoistAirEnthalpy(25, w)) / 1000;
    expect(Math.abs(r.heater.absorbedDutyKw / (dhPerKgDry / (1 + w)) - 1)).toBeLessThan(0.005);
  });

  // With cp at the mean temperature the shortcut is within about 0.5 % for a 200 K rise [calc from the NASA
  // TM-4513 polynomials: cp at the mean temperature against the integrated enthalpy rise].
  it.each(['air', 'oxygen', 'carbon-dioxide', 'methane', 'propane'])(
    '%s: average-cp estimate within 0.5 %% for 300 -> 500 K',
    (gas) => {
      const r = heater({
        gas: { preset: gas },
        inlet: { temperature: q(300, 'K'), pressure: q(1, 'bar') },
        outletTemperature: q(500, 'K'),
      });
      expect(Math.abs(r.heater.averageCpDifferencePercent)).toBeLessThan(0.5);
      expect(r.heater.averageCpDutyKw).toBeCloseTo((r.massFlowKgPerS * r.heater.cpMeanJPerKgK * 200) / 1000, 9);
    },
  );

  it('design duty = absorbed x (1 + loss %) x (1 + margin %), and picks the next catalogue rating', () => {
    const r = heater({ heatLossPercent: 5, designMarginPercent: 10 });
    const h = r.heater;
    expect(h.heatLossKw).toBeCloseTo(h.absorbedDutyKw * 0.05, 9);
    expect(h.marginKw).toBeCloseTo((h.absorbedDutyKw + h.heatLossKw) * 0.1, 9);
    expect(h.designDutyKw).toBeCloseTo(h.absorbedDutyKw * 1.05 * 1.1, 9);
    const next = [...DEFAULT_HEATER_RATINGS_KW].sort((a, b) => a - b).find((x) => x >= h.designDutyKw);
    expect(h.selectedRatingKw).toBe(next);
  });

  it('uses a per-request rating list, and says so when the duty is above it', () => {
    expect(heater({ heaterRatingsKw: [250, 100, 300] }).heater.selectedRatingKw).toBe(250);
    const over = heater({ heaterRatingsKw: [50, 100] });
    expect(over.heater.selectedRatingKw).toBeNull();
    expect(over.heater.electrical.powerBasis).toBe('design-duty');
    expect(over.warnings.map((w) => w.code)).toContain('above-rating-list');
  });

  it('outlet actual flow is the inlet flow scaled by T_out/T_in at constant pressure', () => {
    const r = heater();
    expect(r.heater.outletActualFlowM3PerH / r.inletActualFlowM3PerH).toBeCloseTo(623.15 / 293.15, 9);
  });

  it('reports cp, cv and k at inlet, outlet and mean with cp - cv = R', () => {
    const { inlet, outlet, mean } = heater().heater.properties;
    for (const p of [inlet, outlet, mean]) expect(p.cpJPerKgK - p.cvJPerKgK).toBeCloseTo(287.05, 1);
    expect(mean.temperatureC).toBeCloseTo(185, 9);
    expect(outlet.k).toBeLessThan(inlet.k);
  });
});

describe('heater properties (fast-check)', () => {
  const air = presetGas('air')!;
  const t = fc.double({ min: 200, max: 6000, noNaN: true });

  it('energy balance: duty 1->2 plus 2->3 equals duty 1->3', () => {
    fc.assert(
      fc.property(t, t, t, fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (a, b, c, m) => {
        const sum = absorbedDutyKw(air, m, a, b) + absorbedDutyKw(air, m, b, c);
        expect(sum).toBeCloseTo(absorbedDutyKw(air, m, a, c), 6);
      }),
    );
  });

  it('duty rises with flow and with temperature rise', () => {
    fc.assert(
      fc.property(
        t,
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        (t1, dt, m) => {
          fc.pre(t1 + 2 * dt <= 6000);
          const base: HeaterCase = {
            gas: air,
            massFlowKgPerS: m,
            inletTemperatureK: t1,
            outletTemperatureK: t1 + dt,
            pressurePa: 1e5,
            heatLossPercent: 0,
            designMarginPercent: 0,
            voltageV: 400,
            phases: 3,
            ratingsKw: DEFAULT_HEATER_RATINGS_KW,
          };
          const d = sizeHeater(base).absorbedDutyKw;
          expect(sizeHeater({ ...base, massFlowKgPerS: 2 * m }).absorbedDutyKw).toBeGreaterThan(d);
          expect(sizeHeater({ ...base, outletTemperatureK: t1 + 2 * dt }).absorbedDutyKw).toBeGreaterThan(d);
        },
      ),
    );
  });
});
