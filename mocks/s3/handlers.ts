import { createHash, randomUUID } from 'node:crypto';
import { http, HttpResponse } from 'msw';
import { decodeAwsChunked } from './aws-chunked';
import { errorXml, listV2Xml } from './xml';

export type FakeObject = {
  bytes: Uint8Array;
  contentType: string;
  lastModified: Date;
  etag: string;
  metadata: Record<string, string>;
};
export type S3Call = { op: 'PutObject' | 'GetObject' | 'HeadObject' | 'DeleteObject' | 'ListObjectsV2'; key: string };

export type S3FakeOptions = {
  /** Base URL the SDK is pointed at, e.g. http://s3.dutywise.test; '*' matches any host (for @mswjs/http-middleware). */
  endpoint: string;
  buckets?: string[];
  /** When set, requests must carry a SigV4 Authorization header for this access key (the signature itself is not checked). */
  accessKeyId?: string;
};

/**
 * An in-memory S3 for tests, speaking the path-style REST calls the AWS SDK makes: PutObject, GetObject,
 * HeadObject, DeleteObject and ListObjectsV2. `setDown(true)` answers 503 to everything (an outage).
 */
export function createS3Fake(opts: S3FakeOptions) {
  const buckets = new Map((opts.buckets ?? ['dutywise']).map((b) => [b, new Map<string, FakeObject>()]));
  const calls: S3Call[] = [];
  let down = false;
  const basePath = opts.endpoint === '*' ? '' : new URL(opts.endpoint).pathname.replace(/\/$/, '');
  const xml = (body: string, status: number) =>
    new HttpResponse(body, {
      status,
      headers: { 'Content-Type': 'application/xml', 'x-amz-request-id': randomUUID() },
    });

  function authorised(request: Request): boolean {
    if (!opts.accessKeyId) return true;
    const auth = request.headers.get('authorization') ?? '';
    return auth.startsWith(`AWS4-HMAC-SHA256 Credential=${opts.accessKeyId}/`);
  }

  async function body(request: Request): Promise<Uint8Array> {
    const raw = new Uint8Array(await request.arrayBuffer());
    const chunked =
      (request.headers.get('content-encoding') ?? '').includes('aws-chunked') ||
      (request.headers.get('x-amz-content-sha256') ?? '').startsWith('STREAMING-');
    return chunked ? decodeAwsChunked(raw) : raw;
  }

  function objectHeaders(o: FakeObject): Record<string, string> {
    const meta = Object.fromEntries(Object.entries(o.metadata).map(([k, v]) => [`x-amz-meta-${k}`, v]));
    return {
      'Content-Type': o.contentType,
      'Content-Length': String(o.bytes.byteLength),
      ETag: o.etag,
      'Last-Modified': o.lastModified.toUTCString(),
      ...meta,
    };
  }

  function list(bucket: string, objects: Map<string, FakeObject>, url: URL) {
    const prefix = url.searchParams.get('prefix') ?? '';
    const maxKeys = Math.min(Number(url.searchParams.get('max-keys') ?? 1000) || 1000, 1000);
    const token = url.searchParams.get('continuation-token');
    const after = token ? Buffer.from(token, 'base64url').toString() : (url.searchParams.get('start-after') ?? '');
    const keys = [...objects.keys()].filter((k) => k.startsWith(prefix) && k > after).sort();
    const page = keys.slice(0, maxKeys);
    const last = page.at(-1);
    const nextToken = keys.length > maxKeys && last ? Buffer.from(last).toString('base64url') : null;
    calls.push({ op: 'ListObjectsV2', key: prefix });
    const listed = page.map((key) => {
      const o = objects.get(key)!;
      return { key, size: o.bytes.byteLength, etag: o.etag, lastModified: o.lastModified };
    });
    return xml(listV2Xml({ bucket, prefix, maxKeys, objects: listed, nextToken }), 200);
  }

  async function route(request: Request): Promise<Response> {
    if (down) return xml(errorXml('ServiceUnavailable', 'The fake S3 is down.'), 503);
    if (!authorised(request))
      return xml(errorXml('InvalidAccessKeyId', 'The access key is not known to this store.'), 403);
    const url = new URL(request.url);
    const path = url.pathname.slice(basePath.length).replace(/^\//, '');
    const slash = path.indexOf('/');
    const bucket = decodeURIComponent(slash < 0 ? path : path.slice(0, slash));
    const key =
      slash < 0
        ? ''
        : path
            .slice(slash + 1)
            .split('/')
            .map(decodeURIComponent)
            .join('/');
    const objects = buckets.get(bucket);
    if (!objects)
      return xml(errorXml('NoSuchBucket', 'The specified bucket does not exist.', { BucketName: bucket }), 404);
    const method = request.method.toUpperCase();
    if (!key) {
      if (method === 'GET' && url.searchParams.get('list-type') === '2') return list(bucket, objects, url);
      return xml(errorXml('NotImplemented', `The fake does not implement ${method} on a bucket.`), 501);
    }
    if (method === 'PUT') {
      if (request.headers.has('x-amz-copy-source'))
        return xml(errorXml('NotImplemented', 'CopyObject is not implemented.'), 501);
      const bytes = await body(request);
      const metadata: Record<string, string> = {};
      request.headers.forEach((v, k) => void (k.startsWith('x-amz-meta-') && (metadata[k.slice(11)] = v)));
      const etag = `"${createHash('md5').update(bytes).digest('hex')}"`;
      objects.set(key, {
        bytes,
        contentType: request.headers.get('content-type') ?? 'binary/octet-stream',
        lastModified: new Date(),
        etag,
        metadata,
      });
      calls.push({ op: 'PutObject', key });
      return new HttpResponse(null, { status: 200, headers: { ETag: etag } });
    }
    const found = objects.get(key);
    if (method === 'GET' || method === 'HEAD') {
      calls.push({ op: method === 'GET' ? 'GetObject' : 'HeadObject', key });
      if (!found)
        return method === 'HEAD'
          ? new HttpResponse(null, { status: 404 })
          : xml(errorXml('NoSuchKey', 'The specified key does not exist.', { Key: key }), 404);
      return new HttpResponse(method === 'GET' ? found.bytes : null, { status: 200, headers: objectHeaders(found) });
    }
    if (method === 'DELETE') {
      objects.delete(key);
      calls.push({ op: 'DeleteObject', key });
      return new HttpResponse(null, { status: 204 });
    }
    return xml(errorXml('NotImplemented', `The fake does not implement ${method}.`), 501);
  }

  const pattern = opts.endpoint === '*' ? '*' : `${opts.endpoint.replace(/\/$/, '')}/*`;
  return {
    handlers: [http.all(pattern, ({ request }) => route(request))],
    calls,
    /** The objects of a bucket, for inspection (and for ageing an object in a test). */
    objects: (bucket = 'dutywise') => buckets.get(bucket) ?? new Map<string, FakeObject>(),
    setDown: (value: boolean) => void (down = value),
    reset: () => {
      for (const b of buckets.values()) b.clear();
      calls.length = 0;
      down = false;
    },
  };
}

export type S3Fake = ReturnType<typeof createS3Fake>;
