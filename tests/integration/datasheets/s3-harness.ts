import { setupServer } from 'msw/node';
import { createS3BlobStore } from '@/lib/blob';
import { createS3Fake } from '@/mocks/s3/handlers';

// The S3 store talking through the real AWS SDK to the in-memory fake; msw intercepts the SDK's HTTP.
export const s3Endpoint = 'http://s3.dutywise.test';
export const s3Fake = createS3Fake({ endpoint: s3Endpoint, buckets: ['dutywise-test'], accessKeyId: 'AKTESTDUTYWISE' });
export const s3Server = setupServer(...s3Fake.handlers);
export const s3Store = createS3BlobStore({
  bucket: 'dutywise-test',
  region: 'us-east-1',
  endpoint: s3Endpoint,
  accessKeyId: 'AKTESTDUTYWISE',
  secretAccessKey: 'test-secret',
});

/** Keys the fake holds under one account. */
export function s3KeysOf(accountId: string): string[] {
  return [...s3Fake.objects('dutywise-test').keys()].filter((k) => k.startsWith(`accounts/${accountId}/`));
}
