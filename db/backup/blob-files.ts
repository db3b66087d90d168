// Copying stored objects out of the blob store into a backup folder, and back into a store on restore.
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { sha256Hex, type BlobStore } from '@/lib/blob';
import type { BackedUpBlob } from './manifest';

const BLOB_DIR = 'blobs';

/**
 * Downloads every listed object into `<dir>/blobs/<key>`; keys are already validated account paths
 * (accounts/<uuid>/<plain segments>), so they map to folders safely. A datasheet or quote PDF whose bytes no
 * longer match the hash recorded when it was stored fails the backup: copying a damaged document would hide the damage.
 */
export async function copyBlobsOut(store: BlobStore, blobs: BackedUpBlob[], dir: string): Promise<BackedUpBlob[]> {
  const out: BackedUpBlob[] = [];
  for (const blob of blobs) {
    const got = await store.get(blob.key);
    if (!got) throw new Error(`object ${blob.key} is referenced by ${blob.kind}s but missing from the store`);
    const sha256 = sha256Hex(got.bytes);
    if (blob.kind !== 'upload' && sha256 !== blob.sha256)
      throw new Error(`object ${blob.key} does not match the SHA-256 recorded when it was issued`);
    const file = path.posix.join(BLOB_DIR, blob.key);
    await mkdir(path.join(dir, path.dirname(file)), { recursive: true });
    await writeFile(path.join(dir, file), got.bytes);
    out.push({ ...blob, contentType: got.contentType, byteSize: got.byteSize, sha256, file });
  }
  return out;
}

/** Uploads the copied objects into the target store; the manifest was checked against the files first. */
export async function copyBlobsIn(store: BlobStore, blobs: BackedUpBlob[], dir: string): Promise<number> {
  let copied = 0;
  for (const blob of blobs) {
    if (!blob.file) continue;
    await store.put(blob.key, await readFile(path.join(dir, blob.file)), blob.contentType);
    copied += 1;
  }
  return copied;
}
