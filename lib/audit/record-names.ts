import 'server-only';
import { sql, type SQL } from 'drizzle-orm';
import { paddedDocumentNumber } from '@/lib/support/numbers';

// Audit entries store the id of what they touched; people know records by number and name. These SQL pieces
// read the record's name for the trail, and turn a typed record number back into the ids to filter on.

/** The touched record's number and name ("S26-01001 Dryer air heater"), null when it no longer exists. */
export const recordNameSql: SQL<string | null> = sql<string | null>`case "audit_log"."entity_type"
  when 'sizing' then (select z.number || ' ' || z.title from sizings z where z.id::text = "audit_log"."entity_id")
  when 'quote' then (select q.number || ' ' || q.title from quotes q where q.id::text = "audit_log"."entity_id")
  when 'account' then (select a.name from accounts a where a.id::text = "audit_log"."entity_id")
  when 'user' then (select u.name from users u where u.id::text = "audit_log"."entity_id")
  when 'datasheet_revision' then (select d.number || ' rev ' || r.revision from datasheet_revisions r
    join datasheets d on d.id = r.datasheet_id where r.id::text = "audit_log"."entity_id")
  end`;

/** Entries about the record a number names: the sizing, quote or datasheet (each of its revisions). */
export function entityIdsForNumber(typed: string): SQL {
  const number = paddedDocumentNumber(typed) ?? typed.trim().toUpperCase();
  return sql`"audit_log"."entity_id" in (
    select z.id::text from sizings z where z.number = ${number}
    union select q.id::text from quotes q where q.number = ${number}
    union select r.id::text from datasheet_revisions r join datasheets d on d.id = r.datasheet_id where d.number = ${number})`;
}
