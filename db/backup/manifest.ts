// The manifest written beside every backup: what it holds, from where, and the SHA-256 of every file,
// so a restore can refuse a damaged or incomplete copy before touching the target.
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';

export const MANIFEST_FILE = 'manifest.json';
export const DUMP_FILE = 'database.dump';
export const MANIFEST_FORMAT = 'dutywise-backup/1';

export type BackedUpBlob = {
  key: string;
  /** Which table points at it. */
  kind: 'datasheet' | 'quote-document' | 'upload';
  contentType: string;
  byteSize: number;
  sha256: string;
  /** Relative path of the copied bytes; absent when the bytes live in the dump (PostgreSQL store). */
  file?: string;
};

export type BackupManifest = {
  format: typeof MANIFEST_FORMAT;
  createdAt: string;
  source: { database: string; serverVersion: string; dumpTool: string };
  /** The last applied migration: a restore brings back exactly this schema. */
  migrations: { count: number; lastHash: string | null };
  blobStore: 'postgres' | 's3';
  files: { path: string; byteSize: number; sha256: string }[];
  blobs: BackedUpBlob[];
  /** Rows per table at the snapshot, compared after a restore. */
  tables: Record<string, number>;
};

/** SHA-256 of a file, streamed so a large dump is never held in memory. */
export function sha256File(file: string): Promise<string> {
  return new Promise((resolve, reject) => {
    const hash = createHash('sha256');
    createReadStream(file)
      .on('data', (c) => hash.update(c))
      .on('error', reject)
      .on('end', () => resolve(hash.digest('hex')));
  });
}

export async function writeManifest(dir: string, manifest: BackupManifest): Promise<void> {
  await writeFile(path.join(dir, MANIFEST_FILE), `${JSON.stringify(manifest, null, 2)}\n`);
}

/** Reads and checks a backup's manifest; throws a plain explanation when it is missing or not ours. */
export async function readManifest(dir: string): Promise<BackupManifest> {
  let text: string;
  try {
    text = await readFile(path.join(dir, MANIFEST_FILE), 'utf8');
  } catch {
    throw new Error(`${dir} holds no ${MANIFEST_FILE}: not a Dutywise backup, or one that did not finish`);
  }
  const manifest = JSON.parse(text) as BackupManifest;
  if (manifest.format !== MANIFEST_FORMAT)
    throw new Error(`${dir}: manifest format ${JSON.stringify(manifest.format)} is not ${MANIFEST_FORMAT}`);
  return manifest;
}

/** Every file the manifest lists, hashed again: the names of those that are missing or changed. */
export async function damagedFiles(dir: string, manifest: BackupManifest): Promise<string[]> {
  const listed = [
    ...manifest.files.map((f) => ({ path: f.path, sha256: f.sha256 })),
    ...manifest.blobs.filter((b) => b.file).map((b) => ({ path: b.file!, sha256: b.sha256 })),
  ];
  const bad: string[] = [];
  for (const f of listed) {
    const actual = await sha256File(path.join(dir, f.path)).catch(() => null);
    if (actual !== f.sha256) bad.push(f.path);
  }
  return bad;
}
