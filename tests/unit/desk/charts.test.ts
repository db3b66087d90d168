import { describe, expect, it } from 'vitest';
import { stageChart } from '@/app/_components/sizing-result/charts/compressor-stages';
import { AVERAGE_CP_SPAN_K, heaterCpChart } from '@/app/_components/sizing-result/charts/heater-cp';
import { stageSweep } from '@/app/_components/sizing-result/charts/stage-sweep';
import { calculate, compressorRequestSchema, headlineMethod, type SizingRequest } from '@/lib/engine';
import { compressorRequest, heaterRequest } from './fixtures';

function heater(request: SizingRequest) {
  const r = calculate(request);
  if (r.service !== 'heater') throw new Error('heater expected');
  return r;
}

describe('heater cp chart', () => {
  it("marks the engine's own mean-temperature cp and the integrated average", () => {
    const r = heater(heaterRequest);
    const si = heaterCpChart(r, 'si');
    expect(si.meanCp).toBeCloseTo(r.heater.cpMeanJPerKgK / 1000, 12);
    // Δh/ΔT times the flow and the rise gives back the absorbed duty.
    expect(si.integratedCp * r.massFlowKgPerS * r.heater.temperatureRiseK).toBeCloseTo(r.heater.absorbedDutyKw, 9);
    // 1 Btu/(lb °F) = 4186.8 J/(kg K) [pub: NIST SP 811 (2008) B.8].
    expect(heaterCpChart(r, 'us').meanCp).toBeCloseTo(r.heater.cpMeanJPerKgK / 4186.8, 12);
  });

  it('spans the heater range and the 200 K band about the mean, flagged when the rise exceeds it', () => {
    const wide = heaterCpChart(heater(heaterRequest), 'si');
    expect(wide.band.to - wide.band.from).toBeCloseTo(AVERAGE_CP_SPAN_K, 9);
    expect(wide.points[0]!.t).toBeLessThanOrEqual(wide.inletT);
    expect(wide.points.at(-1)!.t).toBeGreaterThanOrEqual(wide.outletT);
    expect(wide.beyondBand).toBe(true);
    const narrow = heaterCpChart(heater({ ...heaterRequest, outletTemperature: { value: 115, unit: 'degC' } }), 'si');
    expect(narrow.beyondBand).toBe(false);
    expect(narrow.points[0]!.t).toBeCloseTo(narrow.band.from, 9);
  });

  it('draws air cp rising with temperature from about 1.005 kJ/(kg K) near 300 K [mem: ideal-gas air tables in standard thermodynamics texts]', () => {
    const chart = heaterCpChart(
      heater({ ...heaterRequest, inlet: { ...heaterRequest.inlet, temperature: { value: 26.85, unit: 'degC' } } }),
      'si',
    );
    const first = chart.points[0]!;
    const at300 = chart.points.find((p) => Math.abs(p.t - 26.85) < 1e-6) ?? first;
    expect(at300.cp).toBeCloseTo(1.005, 2);
    for (let i = 1; i < chart.points.length; i++) expect(chart.points[i]!.cp).toBeGreaterThan(chart.points[i - 1]!.cp);
  });
});

describe('compressor charts', () => {
  it('has one bar per stage against the default 150 °C limit, shown as 302 °F [mem: API 618 5th ed.; exact unit conversion]', () => {
    const r = calculate({ ...compressorRequest, gas: { preset: 'nitrogen' } });
    if (r.service !== 'compressor') throw new Error('compressor expected');
    const us = stageChart(r, 'us');
    expect(us.bars).toHaveLength(3);
    expect(us.limitT).toBeCloseTo(302, 9);
    headlineMethod(r.compressor).stages.forEach((s, i) => {
      expect(us.bars[i]!.powerKw).toBe(s.gasPowerKw);
      expect(us.bars[i]!.overLimit).toBe(s.dischargeTemperatureC > 150);
    });
  });

  it('sweeps 1-6 stages with the selected count equal to the direct sizing', () => {
    const input = compressorRequestSchema.parse(compressorRequest);
    const sweep = stageSweep(input, 'si');
    const direct = calculate(compressorRequest);
    if (direct.service !== 'compressor') throw new Error('compressor expected');
    expect(sweep.points.map((p) => p.stages)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(sweep.points[2]!.shaftPowerKw).toBe(direct.compressor.shaftPowerKw);
    expect(sweep.selected).toBe(3);
    expect(sweep.suggested).toBe(direct.compressor.suggestedStages);
    // Intercooling makes every added stage cheaper and cooler here.
    for (let i = 1; i < 6; i++) {
      expect(sweep.points[i]!.shaftPowerKw!).toBeLessThan(sweep.points[i - 1]!.shaftPowerKw!);
      expect(sweep.points[i]!.maxDischargeT!).toBeLessThan(sweep.points[i - 1]!.maxDischargeT!);
    }
  });

  // 239.1 and 203.8 kJ/kg [calc: w = cp T1 (r^((k-1)/k) - 1) per stage, k 1.4, cp 1.005 kJ/(kg K)].
  it('reproduces the one- and two-stage work of air at r = 8', () => {
    const input = compressorRequestSchema.parse({
      service: 'compressor',
      gas: { preset: 'air' },
      flow: { value: 1, unit: 'kg/s' },
      inlet: { temperature: { value: 293.15, unit: 'K' }, pressure: { value: 100, unit: 'kPa' } },
      dischargePressure: { value: 800, unit: 'kPa' },
      isentropicEfficiency: 1,
      mechanicalEfficiency: 1,
      method: 'constant-k',
      k: 1.4,
      cpJPerKgK: 1005,
      dischargeTemperatureLimit: { value: 350, unit: 'degC' },
      equationOfState: 'ideal-gas',
    });
    const sweep = stageSweep(input, 'si');
    expect(Math.abs(sweep.points[0]!.shaftPowerKw! / 239.1 - 1)).toBeLessThan(0.005);
    expect(Math.abs(sweep.points[1]!.shaftPowerKw! / 203.8 - 1)).toBeLessThan(0.005);
    expect(sweep.suggested).toBe(1);
  });
});
