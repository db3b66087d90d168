import 'server-only';
import { env } from '@/lib/env';
import { createPostgresBlobStore } from './postgres-store';
import { createS3BlobStore, type S3StoreConfig } from './s3-store';
import type { BlobStore } from './types';

/** The S3 settings from the environment. */
export function s3ConfigFromEnv(): S3StoreConfig {
  return {
    bucket: env.S3_BUCKET,
    region: env.S3_REGION,
    endpoint: env.S3_ENDPOINT,
    accessKeyId: env.S3_ACCESS_KEY_ID,
    secretAccessKey: env.S3_SECRET_ACCESS_KEY,
  };
}

let configured: BlobStore | null = null;

/** The store chosen by BLOB_STORE (postgres by default), built once per process. */
export function getBlobStore(): BlobStore {
  configured ??= env.BLOB_STORE === 's3' ? createS3BlobStore(s3ConfigFromEnv()) : createPostgresBlobStore();
  return configured;
}
