/** What a picker shows to tell accounts apart: the name, then the site and billing contact where there are any. */
export function accountOptionLabel(a: {
  name: string;
  site?: string | null;
  billingContactEmail?: string | null;
}): string {
  const extra = [a.site, a.billingContactEmail].filter(Boolean).join(' · ');
  return extra ? `${a.name} — ${extra}` : a.name;
}

/** A company name compared as people mean it: case, surrounding and repeated spaces ignored. */
export function comparableName(name: string): string {
  return name.trim().replace(/\s+/g, ' ').toLowerCase();
}
