import { formatHeadline } from '@/lib/sizings/headline';
import type { SizingSummary } from '@/lib/sizings/queries';

/** What a picker needs to know about a saved sizing, ready to hand to a client component. */
export type SizingOption = { id: string; number: string; title: string; equipmentTag: string | null; headline: string };

export function toSizingOption(s: SizingSummary): SizingOption {
  return {
    id: s.id,
    number: s.number,
    title: s.title,
    equipmentTag: s.equipmentTag,
    headline: formatHeadline(s.service, s.headlineKw),
  };
}

export function sizingOptionLabel(s: SizingOption): string {
  return [s.number, s.title, s.equipmentTag, s.headline].filter(Boolean).join(' · ');
}
