import { describe, expect, it } from 'vitest';
import { switchUnitValue, type SwitchContext } from '@/app/(desk)/size/_lib/convert';
import { defaultValues } from '@/app/(desk)/size/_lib/defaults';
import { QUANTITY_FIELDS, type QuantityPath } from '@/app/(desk)/size/_lib/form-types';
import { quantityAt, switchContextOf, switchUnitSystem } from '@/app/(desk)/size/_lib/switch-system';
import { UNIT_GROUPS } from '@/app/(desk)/size/_lib/unit-pickers';
import { toSi, type QuantityKind } from '@/lib/units';

const atm: SwitchContext = { barometricPressurePa: 101_325, flow: null };
// Dry air at an ordinary inlet state, for conversions that go through density.
const airCtx: SwitchContext = {
  barometricPressurePa: 101_325,
  flow: { molarMassKgPerKmol: 28.9647, temperatureK: 293.15, pressurePa: 201_325 },
};
const n = (r: ReturnType<typeof switchUnitValue>) => (r.ok ? Number(r.value) : NaN);

describe('switching one field keeps the physical value', () => {
  it('temperature: 15 °C is 59 °F and 288.15 K [pub: NIST SP 811 (2008) 4.2.1.1, exact]', () => {
    expect(n(switchUnitValue('temperature', '15', 'degC', 'degF', atm))).toBe(59);
    expect(n(switchUnitValue('temperature', '15', 'degC', 'K', atm))).toBe(288.15);
    expect(n(switchUnitValue('temperature', '59', 'degF', 'degR', atm))).toBe(518.67);
  });

  it('pressure: gauge readings convert through the site barometric pressure [pub: NIST SP 811 B.8, 1 psi = 6.894757 kPa]', () => {
    expect(n(switchUnitValue('pressure', '3', 'barg', 'psig', atm))).toBeCloseTo(300 / 6.894757, 3);
    expect(n(switchUnitValue('pressure', '3', 'barg', 'kPa', atm))).toBeCloseTo(401.325, 6);
    const highSite = { ...atm, barometricPressurePa: 95_000 };
    expect(n(switchUnitValue('pressure', '0', 'barg', 'kPa', highSite))).toBeCloseTo(95, 6);
    expect(n(switchUnitValue('barometric', '101.325', 'kPa', 'psia', atm))).toBeCloseTo(101.325 / 6.894757, 4);
  });

  it('mass flow: 1 lb = 0.45359237 kg exactly [pub: NIST SP 811 B.8]', () => {
    expect(n(switchUnitValue('flow', '2000', 'kg/h', 'lb/h', atm))).toBeCloseTo(2000 / 0.45359237, 2);
    expect(n(switchUnitValue('flow', '2', 't/h', 'kg/h', atm))).toBe(2000);
  });

  // [calc: ideal gas; ft3 and psi per NIST SP 811; 0 °C, 101.325 kPa per DIN 1343; 60 °F, 14.696 psia [cp]].
  it('standard volume: 1 SCFM (60 °F, 14.696 psia) is 1.6075 Nm³/h', () => {
    expect(n(switchUnitValue('flow', '1', 'SCFM', 'Nm3/h', airCtx))).toBeCloseTo(1.6075, 3);
  });

  it('mass to standard volume through density: air at 15 °C, 1 atm is 1.2250 kg/m³ [pub: U.S. Standard Atmosphere 1976, sea level]', () => {
    expect(n(switchUnitValue('flow', '1225', 'kg/h', 'Sm3/h', airCtx))).toBeCloseTo(1000, -0.5);
  });

  it('round-trips between every pair of units of each picker', () => {
    const samples: Record<string, string> = {
      flow: '1234.5',
      temperature: '45.6',
      pressure: '7.25',
      barometric: '99.1',
    };
    const quantityKind: Record<string, QuantityKind> = {
      flow: 'flow',
      temperature: 'temperature',
      pressure: 'pressure',
      barometric: 'pressure',
    };
    for (const [kind, groups] of Object.entries(UNIT_GROUPS) as [
      keyof typeof UNIT_GROUPS,
      (typeof UNIT_GROUPS)[keyof typeof UNIT_GROUPS],
    ][]) {
      const units = groups.flatMap((g) => g.units);
      const from = units[0]!;
      const start = samples[kind]!;
      for (const to of units) {
        const there = switchUnitValue(kind, start, from, to, airCtx);
        expect(there.ok, `${from} -> ${to}`).toBe(true);
        const siStart = toSi(quantityKind[kind]!, Number(start), from, {
          barometricPressurePa: 101_325,
          flow: airCtx.flow!,
        });
        const siThere = toSi(quantityKind[kind]!, n(there), to, { barometricPressurePa: 101_325, flow: airCtx.flow! });
        expect(Math.abs(siThere / siStart - 1), `${from} -> ${to}`).toBeLessThan(1e-6);
        // Back again from the unrounded figure: exactly the text typed, however many times it is switched.
        const back = switchUnitValue(
          kind,
          there.ok ? there.value : '',
          to,
          from,
          airCtx,
          there.ok ? there.exact : null,
        );
        expect(back.ok && back.value, `${to} -> ${from}`).toBe(from === to ? start : String(Number(start)));
        // Back from the rounded text alone (the field was retyped): still the same physical value.
        const retyped = switchUnitValue(kind, there.ok ? there.value : '', to, from, airCtx);
        const siBack = toSi(quantityKind[kind]!, n(retyped), from, {
          barometricPressurePa: 101_325,
          flow: airCtx.flow!,
        });
        expect(Math.abs(siBack / siStart - 1), `${to} -> ${from} retyped`).toBeLessThan(1e-6);
      }
    }
  });

  it('leaves blank text blank and refuses what it cannot convert', () => {
    expect(switchUnitValue('flow', '', 'kg/h', 'SCFM', atm)).toEqual({ ok: true, value: '', exact: null });
    expect(switchUnitValue('temperature', 'hot', 'degC', 'degF', atm).ok).toBe(false);
    const noGas = switchUnitValue('flow', '100', 'kg/h', 'Nm3/h', atm);
    expect(noGas.ok).toBe(false);
    expect(!noGas.ok && noGas.reason).toMatch(/gas/);
  });
});

describe('switching the unit system', () => {
  const physical = (v: ReturnType<typeof defaultValues>, path: QuantityPath) => {
    const q = quantityAt(v, path);
    const kind = QUANTITY_FIELDS[path];
    const ctx = switchContextOf(v);
    const qk: QuantityKind = kind === 'barometric' ? 'pressure' : kind;
    return q.value === ''
      ? null
      : toSi(qk, Number(q.value), q.unit, {
          barometricPressurePa: ctx.barometricPressurePa,
          flow: ctx.flow ?? undefined,
        });
  };

  it('converts every quantity to the other system and keeps each physical value and its family', () => {
    const si = defaultValues('si');
    si.flow = { value: '1500', unit: 'Nm3/h' };
    const { values: us, skipped } = switchUnitSystem(si, 'us');
    expect(skipped).toEqual([]);
    expect(us.flow.unit).toBe('SCFM');
    expect(us.inlet.pressure.unit).toBe('psig');
    expect(us.inlet.temperature.unit).toBe('degF');
    for (const path of Object.keys(QUANTITY_FIELDS) as QuantityPath[]) {
      const a = physical(si, path);
      const b = physical(us, path);
      if (a === null) expect(b).toBeNull();
      else expect(Math.abs((b ?? NaN) / a - 1), path).toBeLessThan(1e-6);
    }
    const { values: back } = switchUnitSystem(us, 'si', switchUnitSystem(si, 'us').exact);
    expect(back.flow).toEqual({ value: '1500', unit: 'Nm3/h' });
    expect(back.inlet.pressure).toEqual(si.inlet.pressure);
  });

  it('keeps a field it cannot convert in its own unit', () => {
    const si = defaultValues('si');
    si.inlet.temperature.value = 'twenty';
    const { values, skipped } = switchUnitSystem(si, 'us');
    expect(skipped).toContain('inlet.temperature');
    expect(values.inlet.temperature).toEqual({ value: 'twenty', unit: 'degC' });
  });
});
