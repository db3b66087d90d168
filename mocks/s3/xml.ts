// The few S3 XML bodies the fake answers with, shaped as the S3 REST API documents them.
export type ListedObject = { key: string; size: number; etag: string; lastModified: Date };

export function xmlEscape(text: string): string {
  return text.replace(
    /[<>&'"]/g,
    (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', "'": '&apos;', '"': '&quot;' })[c] ?? c,
  );
}

const head = '<?xml version="1.0" encoding="UTF-8"?>';

export function errorXml(code: string, message: string, extra: Record<string, string> = {}): string {
  const fields = Object.entries(extra)
    .map(([k, v]) => `<${k}>${xmlEscape(v)}</${k}>`)
    .join('');
  return `${head}<Error><Code>${code}</Code><Message>${xmlEscape(message)}</Message>${fields}</Error>`;
}

export function listV2Xml(opts: {
  bucket: string;
  prefix: string;
  maxKeys: number;
  objects: ListedObject[];
  nextToken: string | null;
  startAfter?: string;
}): string {
  const contents = opts.objects
    .map(
      (o) =>
        `<Contents><Key>${xmlEscape(o.key)}</Key><LastModified>${o.lastModified.toISOString()}</LastModified><ETag>${xmlEscape(o.etag)}</ETag><Size>${o.size}</Size><StorageClass>STANDARD</StorageClass></Contents>`,
    )
    .join('');
  const next = opts.nextToken ? `<NextContinuationToken>${xmlEscape(opts.nextToken)}</NextContinuationToken>` : '';
  return (
    `${head}<ListBucketResult xmlns="http://s3.amazonaws.com/doc/2006-03-01/"><Name>${xmlEscape(opts.bucket)}</Name><Prefix>${xmlEscape(opts.prefix)}</Prefix>` +
    `<KeyCount>${opts.objects.length}</KeyCount><MaxKeys>${opts.maxKeys}</MaxKeys><IsTruncated>${opts.nextToken ? 'true' : 'false'}</IsTruncated>${contents}${next}</ListBucketResult>`
  );
}
