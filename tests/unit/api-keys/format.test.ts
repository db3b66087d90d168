import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { apiKeyPrefix, bearerToken, generateApiKey, hashApiKey } from '@/lib/api-keys/format';

describe('API key format', () => {
  it('a new key carries its prefix, 256 random bits, and is stored as its SHA-256 only', () => {
    const a = generateApiKey();
    const b = generateApiKey();
    expect(a.key).toMatch(/^dwk_[a-z2-9]{8}_[A-Za-z0-9_-]{43}$/);
    expect(apiKeyPrefix(a.key)).toBe(a.prefix);
    expect(a.secretHash).toBe(createHash('sha256').update(a.key).digest('hex'));
    expect(a.secretHash).not.toContain(a.key.slice(13));
    expect(b.key).not.toBe(a.key);
    expect(b.prefix).not.toBe(a.prefix);
    expect(hashApiKey(a.key)).toBe(a.secretHash);
  });

  it('anything that is not one of ours has no prefix', () => {
    const { key } = generateApiKey();
    for (const bad of ['', 'dwk_', key.slice(0, -1), `${key}x`, key.replace('dwk_', 'dwx_'), ` ${key}`])
      expect(apiKeyPrefix(bad), bad).toBeNull();
  });

  it('reads the key from a Bearer header; another scheme or an empty one reads as an empty key', () => {
    const h = (v?: string) => new Headers(v === undefined ? {} : { authorization: v });
    expect(bearerToken(h())).toBeNull();
    expect(bearerToken(h('Bearer dwk_abc'))).toBe('dwk_abc');
    expect(bearerToken(h('bearer   dwk_abc  '))).toBe('dwk_abc');
    expect(bearerToken(h('Basic Zm9vOmJhcg=='))).toBe('');
    expect(bearerToken(h('Bearer'))).toBe('');
  });
});
