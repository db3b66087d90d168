import { describe, expect, it } from 'vitest';
import { CONTINUOUS_LOAD_FACTOR, calculate, continuousCurrentA, lineCurrentA, type HeaterResult } from '@/lib/engine';
import { heaterRequest, q } from './requests';

describe('line current of a balanced resistive load', () => {
  // I = P / (√3 V): 100 kW is 144.3 A at 400 V and 120.3 A at 480 V [calc: balanced three-phase power P = √3 V I].
  it('100 kW three-phase: 144.3 A at 400 V, 120.3 A at 480 V', () => {
    expect(lineCurrentA(100, 400, 3)).toBeCloseTo(144.3, 1);
    expect(lineCurrentA(100, 480, 3)).toBeCloseTo(120.3, 1);
  });
  it('single-phase I = P / V', () => {
    expect(lineCurrentA(10, 230, 1)).toBeCloseTo(43.478, 3);
  });
  it('125 % for continuous loads [mem: NEC 424.4(B)]', () => {
    expect(CONTINUOUS_LOAD_FACTOR).toBe(1.25);
    expect(continuousCurrentA(80)).toBe(100);
  });
});

describe('heater electrical block', () => {
  const heater = (overrides: Record<string, unknown>) => calculate(heaterRequest(overrides)) as HeaterResult;

  it('defaults to 400 V three-phase and figures the current on the selected rating', () => {
    const e = heater({ heaterRatingsKw: [100, 200, 300] }).heater.electrical;
    expect(e).toMatchObject({ voltageV: 400, phases: 3, powerBasisKw: 300, powerBasis: 'selected-rating' });
    expect(e.currentA).toBeCloseTo(300_000 / (Math.sqrt(3) * 400), 9);
    expect(e.continuousCurrentA).toBeCloseTo(1.25 * e.currentA, 9);
  });

  it('flags subdivision above 48 A [mem: NEC 424.22(B)] and not below', () => {
    const big = heater({ supply: { voltageV: 480, phases: 3 } });
    expect(big.heater.electrical.subdivisionRequired).toBe(true);
    expect(big.warnings.map((w) => w.code)).toContain('circuit-subdivision');
    const small = heater({ flow: q(20, 'kg/h'), supply: { voltageV: 480, phases: '3' } });
    expect(small.heater.electrical.currentA).toBeLessThan(48);
    expect(small.heater.electrical.subdivisionRequired).toBe(false);
    expect(small.warnings.map((w) => w.code)).not.toContain('circuit-subdivision');
  });
});
