import { type AddressObject, simpleParser } from 'mailparser';
import type { NewMessage } from './message-store';

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const objects = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return objects.flatMap((object) =>
    object.value.map((entry) => entry.address ?? '').filter((address) => address !== ''),
  );
}

/** Raw header lines by lower-case name with folding undone, e.g. `message-id`. */
function headerMap(lines: readonly { key: string; line: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const { key, line } of lines) {
    const value = line
      .slice(line.indexOf(':') + 1)
      .replace(/\r?\n[ \t]+/g, ' ')
      .trim();
    out[key] = out[key] === undefined ? value : `${out[key]}\n${value}`;
  }
  return out;
}

/** Parses one raw RFC 5322 message into the shape the HTTP API serves. */
export async function parseMessage(raw: Buffer, envelope: NewMessage['envelope']): Promise<NewMessage> {
  const parsed = await simpleParser(raw);
  return {
    envelope,
    from: parsed.from?.value[0]?.address ?? null,
    to: addresses(parsed.to),
    cc: addresses(parsed.cc),
    subject: parsed.subject ?? '',
    text: parsed.text ?? null,
    html: typeof parsed.html === 'string' ? parsed.html : null,
    date: parsed.date ? parsed.date.toISOString() : null,
    messageId: parsed.messageId ?? null,
    headers: headerMap(parsed.headerLines),
    attachments: parsed.attachments.map((a) => ({
      filename: a.filename ?? null,
      contentType: a.contentType,
      sizeBytes: a.size,
    })),
    sizeBytes: raw.length,
  };
}
