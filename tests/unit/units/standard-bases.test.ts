import { describe, expect, it } from 'vitest';
import { presetGas } from '@/lib/thermo';
import { STANDARD_FLOW_BASES, flowFromKgPerS, flowToKgPerS, type FlowContext } from '@/lib/units';

const air = presetGas('air')!;
const ctx: FlowContext = { molarMassKgPerKmol: air.molarMassKgPerKmol, temperatureK: 300, pressurePa: 1e5 };

describe('other standard bases', () => {
  // For an ideal gas the moles in one standard cubic foot scale with p/T of the basis [calc: n = pV/(RT)];
  // 1 psi = 6.894757 kPa [pub: NIST SP 811].
  it('SCFM at 14.73 and 14.65 psia hold more and less gas than at 14.696 psia, by the pressure ratio', () => {
    const base = flowToKgPerS(1, 'SCFM', ctx);
    expect(flowToKgPerS(1, 'SCFM@14.73', ctx) / base).toBeCloseTo(14.73 / 14.696, 12);
    expect(flowToKgPerS(1, 'SCFM@14.65', ctx) / base).toBeCloseTo(14.65 / 14.696, 12);
    expect(flowToKgPerS(1, 'MMSCFD@14.73', ctx) / flowToKgPerS(1e6 / 1440, 'SCFM@14.73', ctx)).toBeCloseTo(1, 12);
  });

  it('SCFM at 68 °F holds less gas than at 60 °F, by the absolute-temperature ratio', () => {
    const ratio = flowToKgPerS(1, 'SCFM@68F', ctx) / flowToKgPerS(1, 'SCFM', ctx);
    expect(ratio).toBeCloseTo((60 + 459.67) / (68 + 459.67), 12);
  });

  // ISO 1217 free air delivery is volume at 20 °C and 100 kPa [mem: ISO 1217 annex]:
  // 1 m3/min FAD = 60 x (100/101.325) x (273.15/293.15) = 55.1755 Nm3/h [calc].
  it('1 m3/min of free air delivery is 55.1755 Nm3/h', () => {
    const kgPerS = flowToKgPerS(1, 'FAD m3/min', ctx);
    expect(flowFromKgPerS(kgPerS, 'Nm3/h', ctx)).toBeCloseTo(55.1755, 3);
    expect(flowToKgPerS(60, 'FAD m3/h', ctx)).toBeCloseTo(kgPerS, 12);
  });

  it('names each basis for the datasheet', () => {
    expect(STANDARD_FLOW_BASES['SCFM@14.73'].description).toMatch(/60 °F and 14.73 psia/);
    expect(STANDARD_FLOW_BASES['FAD m3/min'].description).toMatch(/ISO 1217/);
  });

  it('uses the real Z at the reference state when the context gives one', () => {
    const real: FlowContext = { ...ctx, zAt: () => 0.98 };
    expect(flowToKgPerS(1, 'Sm3/h', real) / flowToKgPerS(1, 'Sm3/h', ctx)).toBeCloseTo(1 / 0.98, 12);
    expect(flowToKgPerS(1, 'm3/h', real) / flowToKgPerS(1, 'm3/h', ctx)).toBeCloseTo(1 / 0.98, 12);
  });
});
