import { describe, expect, it } from 'vitest';
import { defaultValues } from '@/app/(desk)/size/_lib/defaults';
import { ambiguousNumber } from '@/app/(desk)/size/_lib/number-entry';
import { validateDesk } from '@/app/(desk)/size/_lib/validate';

describe('number entry on the desk', () => {
  it('refuses "1.000" as ambiguous instead of reading it as 1', () => {
    expect(ambiguousNumber('1.000')).toMatch(/could be 1 or 1000/);
    expect(ambiguousNumber('12.500')).toMatch(/could be 12.5 or 12500/);
    expect(ambiguousNumber('1,000')).toMatch(/thousands separator: write 1000/);
    expect(ambiguousNumber('1,5')).toMatch(/decimal comma: write 1.5/);
    expect(ambiguousNumber('1 000')).toMatch(/spaces between digits: write 1000/);
  });

  it('takes plain decimals as written', () => {
    for (const ok of ['101.325', '14.696', '0.780', '1000', '2.5', '-40', '1e3', '0.05'])
      expect(ambiguousNumber(ok)).toBeNull();
  });

  it('reports the field with the reason and sizes nothing', () => {
    const values = defaultValues('si');
    values.flow.value = '1.000';
    const v = validateDesk(values);
    expect(v.ok).toBe(false);
    if (!v.ok) expect(v.issues.fields.flow).toMatch(/^Flow: "1.000" could be 1 or 1000/);
    values.flow.value = '1000';
    expect(validateDesk(values).ok).toBe(true);
  });
});
