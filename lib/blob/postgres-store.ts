import 'server-only';
import { eq, like } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { blobs } from '@/db/schema';
import { sha256Hex } from './hash';
import { accountIdOfKey } from './key';
import type { BlobListing, BlobStore, StoredBlob } from './types';

// LIKE treats % and _ as wildcards; a prefix is matched literally.
function likePrefix(prefix: string): string {
  return `${prefix.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** The default store: bytes in the `blobs` table, written inside the caller's transaction when one is given. */
export function createPostgresBlobStore(): BlobStore {
  return {
    kind: 'postgres',
    transactional: true,
    async put(key: string, bytes: Uint8Array, contentType: string, tx?: Tx) {
      const accountId = accountIdOfKey(key);
      const data = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
      await (tx ?? db)
        .insert(blobs)
        .values({ key, accountId, contentType, byteSize: data.byteLength, sha256: sha256Hex(data), data });
    },
    async get(key: string): Promise<StoredBlob | null> {
      const [row] = await db
        .select({ data: blobs.data, contentType: blobs.contentType, byteSize: blobs.byteSize })
        .from(blobs)
        .where(eq(blobs.key, key))
        .limit(1);
      return row ? { bytes: row.data, contentType: row.contentType, byteSize: row.byteSize } : null;
    },
    async delete(key: string) {
      await db.delete(blobs).where(eq(blobs.key, key));
    },
    async exists(key: string) {
      const [row] = await db.select({ key: blobs.key }).from(blobs).where(eq(blobs.key, key)).limit(1);
      return Boolean(row);
    },
    async list(prefix: string): Promise<BlobListing[]> {
      const rows = await db
        .select({ key: blobs.key, lastModified: blobs.createdAt })
        .from(blobs)
        .where(like(blobs.key, likePrefix(prefix)));
      return rows;
    },
  };
}
