/** A customer account as the desk's picker needs it: its name and site conditions. */
export type AccountSite = {
  id: string;
  name: string;
  site?: string | null;
  billingContactEmail?: string | null;
  unitSystem?: 'si' | 'us';
  barometricPressureKpa: number | null;
  siteAltitudeM: number | null;
};

/** A draft quote a sizing can be added to. */
export type QuoteOption = { id: string; number: string; title: string; accountId: string };

/** A saved sizing reopened on the desk. */
export type ReopenedSizing = {
  id: string;
  number: string;
  title: string;
  equipmentTag: string | null;
  notes: string | null;
  accountId: string;
  accountName: string;
  revision: number;
  /** True for "revise" (saving makes the next version of this sizing), false for "duplicate". */
  revise: boolean;
};
