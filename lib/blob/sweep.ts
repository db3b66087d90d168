import 'server-only';
import { inArray } from 'drizzle-orm';
import { db } from '@/db';
import { datasheetRevisions, quoteDocuments, uploads } from '@/db/schema';
import { logger } from '@/lib/log/logger';
import { getBlobStore } from './store';
import type { BlobStore } from './types';

export type SweepOptions = {
  /** Only objects at least this old are candidates, so an issue between upload and commit is never swept. */
  olderThanMinutes?: number;
  store?: BlobStore;
  now?: Date;
};

export type SweepReport = { scanned: number; candidates: number; deleted: string[] };

const BATCH = 500;

async function referencedKeys(keys: string[]): Promise<Set<string>> {
  const found = new Set<string>();
  for (let i = 0; i < keys.length; i += BATCH) {
    const batch = keys.slice(i, i + BATCH);
    const [revs, ups, docs] = await Promise.all([
      db
        .select({ key: datasheetRevisions.blobKey })
        .from(datasheetRevisions)
        .where(inArray(datasheetRevisions.blobKey, batch)),
      db.select({ key: uploads.blobKey }).from(uploads).where(inArray(uploads.blobKey, batch)),
      db.select({ key: quoteDocuments.blobKey }).from(quoteDocuments).where(inArray(quoteDocuments.blobKey, batch)),
    ]);
    for (const r of [...revs, ...ups, ...docs]) found.add(r.key);
  }
  return found;
}

/**
 * Deletes objects under accounts/ that no datasheet revision, quote document or upload references and that are older than
 * the cut-off: what is left when the process dies after an S3 upload and before its transaction commits.
 */
export async function sweepOrphanBlobs(opts: SweepOptions = {}): Promise<SweepReport> {
  const minutes = opts.olderThanMinutes ?? 30;
  if (!(Number.isFinite(minutes) && minutes >= 1))
    throw new RangeError(`olderThanMinutes must be at least 1 (got ${minutes})`);
  const store = opts.store ?? getBlobStore();
  const cutoff = (opts.now ?? new Date()).getTime() - minutes * 60_000;
  const listed = await store.list('accounts/');
  const old = listed.filter((o) => o.lastModified.getTime() <= cutoff).map((o) => o.key);
  const referenced = await referencedKeys(old);
  const deleted: string[] = [];
  for (const key of old) {
    if (referenced.has(key)) continue;
    await store.delete(key);
    deleted.push(key);
  }
  if (deleted.length > 0) logger.warn({ store: store.kind, deleted: deleted.length }, 'swept orphan blobs');
  return { scanned: listed.length, candidates: old.length, deleted };
}
