import Link from 'next/link';
import { SelectField } from './select-field';
import { TextField } from './text-field';
import type { AuditFilter } from '@/lib/audit/queries';

const ENTITY_TYPES = [
  'account',
  'quote',
  'sizing',
  'datasheet',
  'datasheet_revision',
  'user',
  'subscription',
  'invitation',
  'upload',
  'search',
  'api_key',
];

/** Entity type and id filters held in the URL (a plain GET form). */
export function AuditFilters({ filter }: { filter: AuditFilter }) {
  const types =
    filter.entityType && !ENTITY_TYPES.includes(filter.entityType)
      ? [...ENTITY_TYPES, filter.entityType]
      : ENTITY_TYPES;
  return (
    <form
      method="get"
      action="/support/audit"
      role="search"
      aria-label="Filter the audit trail"
      className="flex flex-wrap items-end gap-3 rounded-panel border border-paper-line bg-paper-raised p-3"
    >
      <SelectField
        label="Kind of record"
        name="entityType"
        options={types.map((t) => ({ value: t, label: t.replace(/_/g, ' ') }))}
        placeholder="Any type"
        defaultValue={filter.entityType ?? ''}
        className="w-44"
      />
      <TextField
        label="Record number or id"
        name="entityId"
        hint="S26-01001, Q26-0101 or DS26-0501 (leading zeros may be left out), or a record id"
        defaultValue={filter.entityId ?? ''}
        className="min-w-72 flex-1"
      />
      <button
        type="submit"
        className="rounded-md bg-tide-600 px-4 py-2 text-sm font-medium text-white hover:bg-tide-700"
      >
        Apply filters
      </button>
      <Link href="/support/audit" className="px-2 py-2 text-sm text-tide-600 underline">
        Clear
      </Link>
    </form>
  );
}
