import { describe, expect, it, vi } from 'vitest';
import { POST } from '@/app/api/v1/calculate/route';

// The shared rate-limit counter lives in PostgreSQL (integration tests cover it); unit tests stay pure.
vi.mock('@/lib/ratelimit/guard-request', () => ({ limitRequest: async () => null }));
import { GET as getOpenApi } from '@/app/api/v1/openapi/route';
import { heaterRequest } from './requests';

const post = (body: string, headers: Record<string, string> = {}) =>
  POST(
    new Request('http://localhost/api/v1/calculate', {
      method: 'POST',
      body,
      headers: { 'content-type': 'application/json', ...headers },
    }),
  );

describe('POST /api/v1/calculate', () => {
  it('answers 200 with the result', async () => {
    const res = await post(JSON.stringify(heaterRequest()));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.service).toBe('heater');
    expect(body.heater.designDutyKw).toBeGreaterThan(body.heater.absorbedDutyKw);
  });

  it('answers 400 with every refused field', async () => {
    const res = await post(JSON.stringify(heaterRequest({ heatLossPercent: 80, flow: { value: -1, unit: 'kg/h' } })));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.errors.map((e: { path: string }) => e.path).sort()).toEqual(['flow.value', 'heatLossPercent']);
  });

  it('answers 400 at path "" for invalid JSON', async () => {
    const res = await post('{"service": "heater",');
    expect(res.status).toBe(400);
    expect((await res.json()).errors[0].path).toBe('');
  });

  it('answers 413 above 64 KiB', async () => {
    const res = await post(JSON.stringify({ ...heaterRequest(), padding: 'x'.repeat(70 * 1024) }));
    expect(res.status).toBe(413);
  });

  it('never answers 500 for bad input', async () => {
    for (const body of ['null', '[]', '"text"', '42', '{}', '{"service":"compressor"}']) {
      expect((await post(body)).status).toBe(400);
    }
  });
});

describe('GET /api/v1/openapi', () => {
  it('serves an OpenAPI 3.1 document generated from the request schema', async () => {
    const doc = await (await getOpenApi()).json();
    expect(doc.openapi).toBe('3.1.0');
    const request = doc.components.schemas.SizingRequest;
    expect(
      request.oneOf.map((o: { properties: { service: { const: string } } }) => o.properties.service.const),
    ).toEqual(['heater', 'compressor']);
    const heater = request.oneOf[0];
    expect(heater.required).toEqual(expect.arrayContaining(['service', 'gas', 'flow', 'inlet', 'outletTemperature']));
    expect(heater.properties.flow.properties.unit.enum).toContain('Nm3/h');
    expect(heater.additionalProperties).toBe(false);
  });

  it('documents the optional API key, every $ref it uses, and the access answers with their headers', async () => {
    const doc = await (await getOpenApi()).json();
    const post = doc.paths['/api/v1/calculate'].post;
    expect(doc.components.securitySchemes.apiKey).toMatchObject({ type: 'http', scheme: 'bearer' });
    // OpenAPI 3.1 security requirement: an empty object means the key may be left out.
    expect(post.security).toEqual([{}, { apiKey: [] }]);
    expect(Object.keys(post.responses).sort()).toEqual(['200', '400', '401', '413', '429', '503']);
    expect(Object.keys(post.responses[200].headers)).toContain('RateLimit-Policy');
    expect(Object.keys(post.responses[429].headers)).toContain('Retry-After');
    const refs = [...JSON.stringify(doc).matchAll(/"\$ref":"#\/components\/schemas\/([^"]+)"/g)].map((m) => m[1]);
    expect(refs).toContain('Errors');
    for (const name of refs) expect(doc.components.schemas, name).toHaveProperty([name as string]);
  });
});
