import { describe, expect, it } from 'vitest';
import { valuesFromInput } from '@/app/(desk)/size/_lib/from-request';
import { toRequest } from '@/app/(desk)/size/_lib/to-request';
import { calculate, sizingRequestSchema } from '@/lib/engine';
import { compressorRequest } from './fixtures';

describe('reopening a request written with common species names', () => {
  it('puts ids in the mixture rows, so the picker shows them and the sizing is unchanged', () => {
    const named = { ...compressorRequest, gas: { components: { methane: 0.9, ethane: 0.05, nitrogen: 0.05 } } };
    const { values } = valuesFromInput(sizingRequestSchema.parse(named), 'si');
    expect(values.gas.components.map((row) => row.species)).toEqual(['CH4', 'C2H6', 'N2']);
    expect(calculate({ ...compressorRequest, gas: toRequest(values).gas })).toEqual(calculate(compressorRequest));
  });
});
