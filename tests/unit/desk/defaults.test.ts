import { describe, expect, it } from 'vitest';
import { defaultValues } from '@/app/(desk)/size/_lib/defaults';
import { valuesFromInput } from '@/app/(desk)/size/_lib/from-request';
import { toRequest } from '@/app/(desk)/size/_lib/to-request';
import { systemOfUnits } from '@/lib/units';
import { validateDesk } from '@/app/(desk)/size/_lib/validate';
import { calculate, sizingRequestSchema } from '@/lib/engine';
import { compressorRequest, heaterRequest } from './fixtures';

const systems = ['si', 'us'] as const;

describe('desk defaults', () => {
  it.each(systems)('validate against the engine schema and size, both services, in %s units', (system) => {
    for (const service of ['heater', 'compressor'] as const) {
      const v = { ...defaultValues(system), service };
      const checked = validateDesk(v);
      expect(checked.ok, `${system} ${service}`).toBe(true);
      expect(sizingRequestSchema.safeParse(toRequest(v)).success).toBe(true);
      expect(calculate(toRequest(v)).service).toBe(service);
    }
  });

  it.each(systems)('the other gas modes start valid too (%s)', (system) => {
    const mixture = defaultValues(system);
    mixture.gas.mode = 'mixture';
    expect(validateDesk(mixture).ok).toBe(true);
    const humid = defaultValues(system);
    humid.gas.preset = 'humid-air';
    expect(validateDesk(humid).ok).toBe(true);
    humid.gas.humidityBy = 'dew';
    expect(validateDesk(humid).ok).toBe(true);
  });

  it('US defaults are in US customary units, SI in SI', () => {
    expect(defaultValues('us').inlet.pressure.unit).toBe('psig');
    expect(defaultValues('us').inlet.temperature.unit).toBe('degF');
    expect(defaultValues('si').inlet.pressure.unit).toBe('barg');
    expect(defaultValues('si').flow.unit).toBe('kg/h');
  });
});

describe('form values and requests', () => {
  it.each([
    ['heater', heaterRequest],
    ['compressor', compressorRequest],
  ])('a reopened %s request gives the same normalised input', (_, request) => {
    const input = sizingRequestSchema.parse(request);
    const { values, dropped } = valuesFromInput(input, 'si');
    expect(dropped).toEqual([]);
    const again = validateDesk(values);
    expect(again.ok).toBe(true);
    if (!again.ok) return;
    const result = calculate(request);
    const reopened = calculate(again.input);
    expect(reopened.service === 'heater' ? reopened.heater.designDutyKw : reopened.compressor.shaftPowerKw).toBe(
      result.service === 'heater' ? result.heater.designDutyKw : result.compressor.shaftPowerKw,
    );
  });

  it('names fields the desk cannot show when reopening', () => {
    const input = sizingRequestSchema.parse({ ...compressorRequest, k: 1.3 });
    expect(valuesFromInput(input, 'si').dropped).toEqual(['k']);
  });

  it('reports each bad field under its own name with the allowed range', () => {
    const v = defaultValues('si');
    v.heatLossPercent = '60';
    v.flow.value = '-5';
    v.outletTemperature.value = '-300';
    const checked = validateDesk(v);
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.issues.fields.heatLossPercent).toMatch(/^Heat loss: .*from 0 to 50 %/);
    expect(checked.issues.fields.flow).toMatch(/^Flow: .*above 0/);
    expect(checked.issues.fields.outletTemperature).toMatch(/^Outlet temperature: .*below absolute zero/);
  });

  it('reports a mixture that does not sum to 1 on the mixture', () => {
    const v = defaultValues('si');
    v.gas.mode = 'mixture';
    v.gas.components = [
      { species: 'CH4', fraction: '0.8' },
      { species: 'N2', fraction: '0.1' },
    ];
    const checked = validateDesk(v);
    expect(!checked.ok && checked.issues.fields['gas.components']).toMatch(/^Mixture: .*sum to 0\.9/);
  });
});

describe('unit system of a reopened request', () => {
  it('follows the majority of the flow and inlet units', () => {
    expect(systemOfUnits(['SCFM', 'degF', 'psig'])).toBe('us');
    expect(systemOfUnits(['kg/h', 'degF', 'barg'])).toBe('si');
    expect(systemOfUnits(['Nm3/h', 'degC', 'bar'])).toBe('si');
  });
});
