import 'server-only';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { sha256Hex } from './hash';
import { accountIdOfKey } from './key';
import type { BlobListing, BlobStore, StoredBlob } from './types';

export type S3StoreConfig = {
  bucket: string;
  region: string;
  /** An S3-compatible endpoint (MinIO, Ceph, a cloud vendor's); omit for AWS itself. */
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
};

function isNotFound(err: unknown): boolean {
  if (err instanceof S3ServiceException && err.$metadata.httpStatusCode === 404) return true;
  const name = (err as { name?: string } | null)?.name;
  return name === 'NotFound' || name === 'NoSuchKey';
}

/** Builds the SDK client: path-style addressing and checksums only where required, which S3-compatible servers accept. */
export function makeS3Client(config: S3StoreConfig): S3Client {
  const credentials =
    config.accessKeyId && config.secretAccessKey
      ? { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey }
      : undefined;
  return new S3Client({
    region: config.region,
    endpoint: config.endpoint,
    forcePathStyle: true,
    credentials,
    maxAttempts: 2,
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

/**
 * An S3-compatible store. Not transactional: `put` uploads at once, so issuing uploads under a unique key
 * before its commit and deletes the object when the commit fails; sweepOrphanBlobs covers a crash in between.
 */
export function createS3BlobStore(config: S3StoreConfig, client: S3Client = makeS3Client(config)): BlobStore {
  const Bucket = config.bucket;
  return {
    kind: 's3',
    transactional: false,
    async put(key: string, bytes: Uint8Array, contentType: string) {
      accountIdOfKey(key);
      await client.send(
        new PutObjectCommand({
          Bucket,
          Key: key,
          Body: bytes,
          ContentType: contentType,
          ContentLength: bytes.byteLength,
          Metadata: { sha256: sha256Hex(bytes) },
        }),
      );
    },
    async get(key: string): Promise<StoredBlob | null> {
      try {
        const res = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        if (!res.Body) return null;
        const bytes = Buffer.from(await res.Body.transformToByteArray());
        return { bytes, contentType: res.ContentType ?? 'application/octet-stream', byteSize: bytes.byteLength };
      } catch (err) {
        if (isNotFound(err)) return null;
        throw err;
      }
    },
    async delete(key: string) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async exists(key: string) {
      try {
        await client.send(new HeadObjectCommand({ Bucket, Key: key }));
        return true;
      } catch (err) {
        if (isNotFound(err)) return false;
        throw err;
      }
    },
    async list(prefix: string): Promise<BlobListing[]> {
      const out: BlobListing[] = [];
      let token: string | undefined;
      do {
        const res = await client.send(new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken: token }));
        for (const o of res.Contents ?? [])
          if (o.Key) out.push({ key: o.Key, lastModified: o.LastModified ?? new Date(0) });
        token = res.IsTruncated ? res.NextContinuationToken : undefined;
      } while (token);
      return out;
    },
  };
}
