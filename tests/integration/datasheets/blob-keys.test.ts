import { describe, expect, it } from 'vitest';
import { accountIdOfKey, accountKey, BlobKeyError } from '@/lib/blob';

const id = '5b7c1c5e-8f0e-4d5f-9a51-3f1f7c2b9e10';

describe('blob keys are namespaced by account', () => {
  it('builds accounts/<id>/... from plain segments', () => {
    expect(accountKey(id, 'datasheets', 'DS26-0501', 'A-x.pdf')).toBe(`accounts/${id}/datasheets/DS26-0501/A-x.pdf`);
    expect(accountIdOfKey(`accounts/${id}/datasheets/DS26-0501/A-x.pdf`)).toBe(id);
  });

  it('refuses parts that could leave the namespace and ids that are not UUIDs', () => {
    for (const bad of ['..', '../other', 'a/b', '', '.hidden', 'x'.repeat(129)])
      expect(() => accountKey(id, bad)).toThrow(BlobKeyError);
    expect(() => accountKey('not-a-uuid', 'x')).toThrow(/UUID/);
    expect(() => accountKey(id)).toThrow(/at least one part/);
    for (const key of ['datasheets/x.pdf', `accounts/${id}`, `accounts/${id}/../x`, `accounts/${id}//x`])
      expect(() => accountIdOfKey(key)).toThrow(BlobKeyError);
  });
});
