import { describe, expect, it } from 'vitest';
import { sizingRequestSchema } from '@/lib/engine';
import {
  MAX_SHARE_PARAM_CHARS,
  decodeShareParam,
  encodeShareParam,
  sharePath,
} from '@/app/(desk)/size/_lib/share-link';
import { compressorRequest, heaterRequest } from './fixtures';

const b64url = (text: string) => Buffer.from(text, 'utf8').toString('base64url');

describe('share links', () => {
  it.each([
    ['heater', heaterRequest],
    ['compressor mixture', compressorRequest],
  ])('round-trips a %s request to the same validated input', (_, request) => {
    const decoded = decodeShareParam(encodeShareParam(request));
    expect(decoded).toEqual({ ok: true, input: sizingRequestSchema.parse(request) });
  });

  it('keeps non-ASCII text intact', () => {
    const request = { ...heaterRequest, inlet: { ...heaterRequest.inlet, temperature: { value: 15, unit: '°C' } } };
    const decoded = decodeShareParam(encodeShareParam(request));
    expect(decoded.ok && decoded.input.inlet.temperature.unit).toBe('degC');
  });

  it('produces a URL-safe parameter under the length bound', () => {
    const param = encodeShareParam(compressorRequest);
    expect(param).toMatch(/^1\.[A-Za-z0-9_-]+$/);
    expect(param.length).toBeLessThan(MAX_SHARE_PARAM_CHARS);
    expect(sharePath(heaterRequest)).toBe(`/size?i=${encodeShareParam(heaterRequest)}`);
  });

  it('refuses a link whose inputs were edited into an invalid request, naming the field', () => {
    const tampered = `1.${b64url(JSON.stringify({ ...heaterRequest, flow: { value: -5, unit: 'kg/h' } }))}`;
    const decoded = decodeShareParam(tampered);
    expect(decoded.ok).toBe(false);
    expect(!decoded.ok && decoded.reason).toContain('flow.value');
  });

  it('refuses garbled, truncated or foreign parameters', () => {
    const good = encodeShareParam(heaterRequest);
    const cases = [
      good.slice(0, good.length - 7),
      `${good.slice(0, 20)}!${good.slice(21)}`,
      good.slice(2),
      `1.${b64url('not json')}`,
      '1.',
    ];
    for (const param of cases) expect(decodeShareParam(param).ok, param).toBe(false);
    // Bytes that are not UTF-8 are refused rather than decoded into replacement characters.
    expect(decodeShareParam(`1.${Buffer.from([0x7b, 0xff, 0xfe, 0x7d]).toString('base64url')}`).ok).toBe(false);
  });

  it('refuses oversized parameters before decoding them, and will not make one', () => {
    const huge = `1.${'A'.repeat(MAX_SHARE_PARAM_CHARS)}`;
    const decoded = decodeShareParam(huge);
    expect(decoded.ok).toBe(false);
    expect(!decoded.ok && decoded.reason).toContain(String(MAX_SHARE_PARAM_CHARS));
    const ratings = Array.from({ length: 500 }, (_, i) => 1000.123456 + i);
    expect(() => encodeShareParam({ ...heaterRequest, heaterRatingsKw: ratings })).toThrow(/limit/);
  });
});
