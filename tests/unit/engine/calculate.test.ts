import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { GAS_PRESETS, presetGas } from '@/lib/thermo';
import { FLOW_UNITS, PRESSURE_UNITS, TEMPERATURE_UNITS, fromSi } from '@/lib/units';
import { SizingInputError, calculate, calculateCore, sizingRequestSchema, type SizingResult } from '@/lib/engine';
import { compressorRequest, heaterRequest } from './requests';

function allNumbersFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allNumbersFinite);
  if (value && typeof value === 'object') return Object.values(value).every(allNumbersFinite);
  return true;
}

function outcome(input: unknown): 'ok' | 'refused' {
  try {
    const result = calculate(input);
    expect(allNumbersFinite(result)).toBe(true);
    return 'ok';
  } catch (err) {
    expect(err).toBeInstanceOf(SizingInputError);
    const issues = (err as SizingInputError).issues;
    expect(issues.length).toBeGreaterThan(0);
    for (const i of issues) {
      expect(typeof i.path).toBe('string');
      expect(i.message.length).toBeGreaterThan(5);
    }
    return 'refused';
  }
}

describe('calculate never returns NaN and never throws anything but SizingInputError', () => {
  it('for arbitrary JSON', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (json) => {
        outcome(json);
      }),
      { numRuns: 500 },
    );
  });

  it('for arbitrary JSON merged into valid requests (mostly-valid bodies)', () => {
    const base = fc.constantFrom(heaterRequest(), compressorRequest());
    fc.assert(
      fc.property(
        base,
        fc.dictionary(
          fc.constantFrom(
            'flow',
            'inlet',
            'gas',
            'stages',
            'outletTemperature',
            'dischargePressure',
            'heatLossPercent',
            'site',
            'k',
          ),
          fc.jsonValue(),
        ),
        (b, patch) => {
          outcome({ ...b, ...patch });
        },
      ),
      { numRuns: 500 },
    );
  });

  const presets = GAS_PRESETS.filter((p) => p.moleFractions).map((p) => p.id);

  it('for random duty points in any units: results are finite, heaters add heat, units do not matter', () => {
    let sized = 0;
    fc.assert(
      fc.property(
        fc.constantFrom(...presets),
        fc.double({ min: 1e-3, max: 100, noNaN: true }),
        fc.double({ min: 200, max: 2500, noNaN: true }),
        fc.double({ min: 1, max: 3000, noNaN: true }),
        fc.double({ min: 2e4, max: 5e6, noNaN: true }),
        fc.constantFrom(...FLOW_UNITS),
        fc.constantFrom(...TEMPERATURE_UNITS),
        fc.constantFrom(...PRESSURE_UNITS),
        (preset, kgPerS, t1, dt, pa, flowUnit, tUnit, pUnit) => {
          const m = presetGas(preset)!.molarMassKgPerKmol;
          const ctx = { flow: { molarMassKgPerKmol: m, temperatureK: t1, pressurePa: pa } };
          const input = heaterRequest({
            gas: { preset },
            flow: { value: fromSi('flow', kgPerS, flowUnit, ctx), unit: flowUnit },
            inlet: {
              temperature: { value: fromSi('temperature', t1, tUnit), unit: tUnit },
              pressure: { value: fromSi('pressure', pa, pUnit), unit: pUnit },
            },
            outletTemperature: { value: fromSi('temperature', Math.min(t1 + dt, 6000), tUnit), unit: tUnit },
          });
          if (outcome(input) === 'ok') {
            sized++;
            const r = calculate(input) as SizingResult & { service: 'heater' };
            expect(r.massFlowKgPerS / kgPerS).toBeCloseTo(1, 9);
            expect(r.heater.absorbedDutyKw).toBeGreaterThan(0);
            expect(r.heater.designDutyKw).toBeGreaterThanOrEqual(r.heater.absorbedDutyKw);
          }
        },
      ),
      { numRuns: 300 },
    );
    expect(sized).toBeGreaterThan(250); // the generator is meant to produce valid duty points
  });

  it('for random compressor duties: discharge is hotter than suction and intercoolers number N-1', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...presets),
        fc.integer({ min: 1, max: 6 }),
        fc.double({ min: 1.001, max: 200, noNaN: true }),
        fc.double({ min: 0.3, max: 1, noNaN: true }),
        fc.constantFrom('constant-k', 'variable-cp'),
        (preset, stages, ratio, eta, method) => {
          const input = compressorRequest({
            gas: { preset },
            stages,
            dischargePressure: { value: 100 * ratio, unit: 'kPa' },
            isentropicEfficiency: eta,
            method,
          });
          if (outcome(input) === 'ok') {
            const c = (calculate(input) as SizingResult & { service: 'compressor' }).compressor;
            for (const m of [c.constantK, c.variableCp]) {
              expect(m.intercoolerDutiesKw).toHaveLength(stages - 1);
              for (const s of m.stages) expect(s.dischargeTemperatureC).toBeGreaterThan(s.inletTemperatureC);
            }
            expect(c.shaftPowerKw).toBeGreaterThan(c.gasPowerKw);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('validated and fast paths agree', () => {
  it('calculateCore on the parsed input equals calculate', () => {
    for (const input of [
      heaterRequest(),
      compressorRequest({ stages: 3, dischargePressure: { value: 20, unit: 'bar' } }),
    ]) {
      expect(calculateCore(sizingRequestSchema.parse(input))).toEqual(calculate(input));
    }
  });

  it('units on input do not change the physics: the same duty point in SI and US units', () => {
    const si = calculate(
      heaterRequest({
        flow: { value: 1, unit: 'kg/s' },
        inlet: { temperature: { value: 20, unit: 'degC' }, pressure: { value: 2, unit: 'barg' } },
        outletTemperature: { value: 200, unit: 'degC' },
      }),
    ) as SizingResult & { service: 'heater' };
    const us = calculate(
      heaterRequest({
        flow: { value: 3600 / 0.45359237, unit: 'lb/h' },
        inlet: { temperature: { value: 68, unit: 'degF' }, pressure: { value: 2 * 14.503773773, unit: 'psig' } },
        outletTemperature: { value: 392, unit: 'degF' },
      }),
    ) as SizingResult & { service: 'heater' };
    expect(us.heater.absorbedDutyKw).toBeCloseTo(si.heater.absorbedDutyKw, 6);
    expect(us.inletActualFlowM3PerH).toBeCloseTo(si.inletActualFlowM3PerH, 4);
  });

  it('states its basis: property source, barometric pressure and the flow basis used', () => {
    const r = calculate(heaterRequest({ flow: { value: 1000, unit: 'SCFM' }, site: { altitudeM: 1000 } }));
    expect(r.basis.propertySource).toMatch(/NASA TM-4513/);
    expect(r.basis.barometricPressureKpa).toBeCloseTo(89.876, 2);
    expect(r.basis.barometricPressureSource).toMatch(/ISO 2533/);
    expect(r.basis.flowInputBasis).toMatchObject({ unit: 'SCFM', description: expect.stringMatching(/14\.696 psia/) });
    expect(r.flows.scfm).toBeCloseTo(1000, 9);
  });
});
