import type { Tx } from '@/db';

/** One stored object as read back. */
export type StoredBlob = { bytes: Buffer; contentType: string; byteSize: number };

/** A key found by listing, with when it was written (the sweeper's age test). */
export type BlobListing = { key: string; lastModified: Date };

/**
 * Where document bytes live. `transactional` stores (PostgreSQL) write inside the caller's transaction;
 * the others (S3) write at once, so a caller must upload first and delete the object if its commit fails.
 */
export type BlobStore = {
  readonly kind: 'postgres' | 's3';
  readonly transactional: boolean;
  put(key: string, bytes: Uint8Array, contentType: string, tx?: Tx): Promise<void>;
  get(key: string): Promise<StoredBlob | null>;
  delete(key: string): Promise<void>;
  exists(key: string): Promise<boolean>;
  /** Keys under `prefix`, oldest first not guaranteed. */
  list(prefix: string): Promise<BlobListing[]>;
};
