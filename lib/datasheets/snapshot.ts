import type { SizingResult } from '@/lib/engine';

/** One line of the revision table; `sizingVersion` is the version of the sizing the revision was issued from. */
export type RevisionEntry = {
  revision: string;
  issuedAt: string;
  note: string | null;
  issuedByName: string | null;
  sizingVersion?: number;
};

/**
 * Everything a revision was rendered from, stored with it: re-rendering the snapshot gives the same
 * document, and a later change to the sizing or account never alters what was issued.
 */
export type DatasheetSnapshot = {
  schemaVersion: 1;
  datasheet: { number: string; revision: string; issuedAt: string; note: string | null; issuedByName: string };
  account: { id: string; name: string; site: string | null };
  /** The account's unit system when issued (SI for revisions issued before accounts had one). */
  units?: 'si' | 'us';
  sizing: {
    id: string;
    number: string;
    title: string;
    equipmentTag: string | null;
    service: 'heater' | 'compressor';
    gasLabel: string;
    notes: string | null;
    engineVersion: string;
    revision: number;
    createdAt: string;
  };
  input: unknown;
  result: SizingResult;
  /** Every revision up to and including this one, in issue order. */
  revisions: RevisionEntry[];
};

/** The service line printed under the title. */
export function serviceLabel(s: DatasheetSnapshot): string {
  const kind = s.result.service === 'heater' ? 'Electric process gas heater' : 'Process gas compressor';
  return `${kind}, ${s.result.gas.label}`;
}
