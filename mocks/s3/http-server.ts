import type { AddressInfo } from 'node:net';
import { createServer } from '@mswjs/http-middleware';
import { createS3Fake, type S3Fake } from './handlers';

export type RunningS3Fake = { fake: S3Fake; endpoint: string; close: () => Promise<void> };

/**
 * Serves the same in-memory S3 over real HTTP on loopback, for another process (a child under test,
 * the demo) to reach through the SDK. Port 0 picks a free one.
 */
export async function startS3FakeServer(
  opts: { port?: number; buckets?: string[]; accessKeyId?: string } = {},
): Promise<RunningS3Fake> {
  const fake = createS3Fake({ endpoint: '*', buckets: opts.buckets, accessKeyId: opts.accessKeyId });
  const app = createServer(...fake.handlers);
  const server = await new Promise<ReturnType<typeof app.listen>>((resolve) => {
    const s = app.listen(opts.port ?? 0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  return {
    fake,
    endpoint: `http://127.0.0.1:${port}`,
    close: () => new Promise<void>((resolve, reject) => server.close((err?: Error) => (err ? reject(err) : resolve()))),
  };
}
