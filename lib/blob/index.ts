// The blob-store interface and its two implementations; callers import from here.
export { accountIdOfKey, accountKey, BlobKeyError } from './key';
export { sha256Hex } from './hash';
export { createPostgresBlobStore } from './postgres-store';
export { createS3BlobStore, makeS3Client, type S3StoreConfig } from './s3-store';
export { getBlobStore, s3ConfigFromEnv } from './store';
export { sweepOrphanBlobs, type SweepOptions, type SweepReport } from './sweep';
export type { BlobListing, BlobStore, StoredBlob } from './types';
