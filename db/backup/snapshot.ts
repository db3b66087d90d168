// What a backup reads inside the snapshot pg_dump copies: so the listed blobs, the row counts and the
// migration level describe exactly the rows in the dump.
import type { Client } from 'pg';
import type { BackedUpBlob } from './manifest';

/** Starts a read-only repeatable-read transaction and exports its snapshot for pg_dump --snapshot. */
export async function openSnapshot(client: Client): Promise<string> {
  await client.query('begin isolation level repeatable read read only');
  const { rows } = await client.query<{ id: string }>('select pg_export_snapshot() as id');
  return rows[0]!.id;
}

/**
 * Every stored object a row points at. With the PostgreSQL store the bytes are hashed where they lie (and
 * travel in the dump); with S3 the recorded hash of a revision or quote PDF is the reference and uploads are hashed on copy.
 */
export async function referencedBlobs(client: Client, store: 'postgres' | 's3'): Promise<BackedUpBlob[]> {
  if (store === 'postgres') {
    const { rows } = await client.query<BackedUpBlob>(`
      select b.key,
             case when r.blob_key is not null then 'datasheet'
                  when q.blob_key is not null then 'quote-document' else 'upload' end as kind,
             b.content_type as "contentType", b.byte_size as "byteSize", encode(sha256(b.data), 'hex') as sha256
      from blobs b
      left join datasheet_revisions r on r.blob_key = b.key
      left join quote_documents q on q.blob_key = b.key
      left join uploads u on u.blob_key = b.key
      where r.blob_key is not null or q.blob_key is not null or u.blob_key is not null
      order by b.key`);
    return rows;
  }
  const { rows } = await client.query<BackedUpBlob>(`
    select blob_key as key, 'datasheet' as kind, 'application/pdf' as "contentType", byte_size as "byteSize", sha256
    from datasheet_revisions
    union all
    select blob_key, 'quote-document', 'application/pdf', byte_size, sha256 from quote_documents
    union all
    select blob_key, 'upload', content_type, byte_size, '' from uploads
    order by key`);
  return rows;
}

/** Rows per table of the public schema. */
export async function tableCounts(client: Client): Promise<Record<string, number>> {
  const { rows: tables } = await client.query<{ name: string }>(
    `select tablename as name from pg_tables where schemaname = 'public' order by tablename`,
  );
  const counts: Record<string, number> = {};
  for (const { name } of tables) {
    const { rows } = await client.query<{ n: string }>(`select count(*) as n from "${name.replace(/"/g, '""')}"`);
    counts[name] = Number(rows[0]!.n);
  }
  return counts;
}

/** How many migrations drizzle has applied, and the hash of the last. */
export async function migrationLevel(client: Client): Promise<{ count: number; lastHash: string | null }> {
  const { rows } = await client.query<{ hash: string }>(
    `select hash from drizzle.__drizzle_migrations order by created_at, id`,
  );
  return { count: rows.length, lastHash: rows.at(-1)?.hash ?? null };
}

/** The server's version string, recorded in the manifest. */
export async function serverVersion(client: Client): Promise<string> {
  const { rows } = await client.query<{ v: string }>("select current_setting('server_version') as v");
  return rows[0]!.v;
}
