import { describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.RATE_LIMIT_CALCULATE_PER_MIN = '100000';
  process.env.RATE_LIMIT_SIGN_IN_PER_MIN = '100000';
  process.env.RATE_LIMIT_BATCH_PER_HOUR = '100000';
});

import '../helpers/session';
import { POST as signIn } from '@/app/api/auth/sign-in/route';
import { POST as batchPreview } from '@/app/api/v1/batch/preview/route';
import { POST as calculate } from '@/app/api/v1/calculate/route';
import { POST as webhook } from '@/app/api/webhooks/stripe/route';
import { BATCH_MAX_BYTES } from '@/lib/batch/upload-limits';
import { makeUser } from '../helpers/fixtures';
import { actAs } from '../helpers/session';

const TEN_MIB = 10 * 1024 * 1024;
const CHUNK = 64 * 1024;

/** A 10 MiB body sent in chunks with no Content-Length (as chunked transfer encoding arrives), counting what is read. */
function chunkedBody() {
  const pulled = { bytes: 0 };
  const chunk = new Uint8Array(CHUNK).fill(0x20);
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (pulled.bytes >= TEN_MIB) return controller.close();
      pulled.bytes += CHUNK;
      controller.enqueue(chunk);
    },
  });
  return { stream, pulled };
}

function post(url: string, headers: Record<string, string>) {
  const { stream, pulled } = chunkedBody();
  const req = new Request(url, { method: 'POST', body: stream, headers, duplex: 'half' } as RequestInit);
  return { req, pulled };
}

// Each endpoint stops reading at its limit and answers 413; a cap checked after reading would pull all 10 MiB.
describe('request bodies are bounded while they are read', () => {
  it.each([
    ['the calculate API (64 KiB)', calculate, 'http://localhost/api/v1/calculate', {}, 64 * 1024],
    ['sign-in (4 KiB)', signIn, 'http://localhost:3000/api/auth/sign-in', { origin: 'http://localhost:3000' }, 4096],
    [
      'the payment webhook, before its signature check (512 KiB)',
      webhook,
      'http://localhost/api/webhooks/stripe',
      { 'stripe-signature': 't=1,v1=00' },
      512 * 1024,
    ],
  ] as const)('%s', async (_name, handler, url, headers, limit) => {
    const before = process.memoryUsage().rss;
    const { req, pulled } = post(url, { 'content-type': 'application/json', ...headers });
    const res = await (handler as (r: Request) => Promise<Response>)(req);
    expect(res.status).toBe(413);
    expect(pulled.bytes).toBeLessThanOrEqual(limit + 2 * CHUNK);
    expect(process.memoryUsage().rss - before).toBeLessThan(8 * 1024 * 1024);
  });

  it('the batch check (an 8 MiB file and its form framing)', async () => {
    await actAs(await makeUser('sales_engineer'));
    const { req, pulled } = post('http://localhost/api/v1/batch/preview', {
      'content-type': 'multipart/form-data; boundary=x',
    });
    const res = await batchPreview(req, { params: Promise.resolve({}) });
    expect(res.status).toBe(413);
    expect(pulled.bytes).toBeLessThanOrEqual(BATCH_MAX_BYTES + 64 * 1024 + 2 * CHUNK);
  });

  it('a declared Content-Length over the limit is refused without reading', async () => {
    const { stream, pulled } = chunkedBody();
    const req = new Request('http://localhost/api/v1/calculate', {
      method: 'POST',
      body: stream,
      headers: { 'content-length': String(TEN_MIB) },
      duplex: 'half',
    } as RequestInit);
    expect((await calculate(req)).status).toBe(413);
    expect(pulled.bytes).toBeLessThanOrEqual(CHUNK);
  });
});
