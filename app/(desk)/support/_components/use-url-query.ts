'use client';

import { usePathname, useRouter } from 'next/navigation';
import { useCallback, useState } from 'react';
import type { SupportSearch } from '@/lib/support/schema';

/** Keeps the look-up's query in the URL (shareable) and in state (instant). */
export function useUrlQuery(initial: SupportSearch) {
  const router = useRouter();
  const pathname = usePathname();
  const [query, setQuery] = useState<SupportSearch>(initial);
  const update = useCallback(
    (patch: Partial<SupportSearch>) => {
      setQuery((prev) => {
        // Any change but paging starts again at the first page.
        const next = { ...prev, ...patch, page: patch.page ?? 1, cursor: patch.cursor };
        router.replace(`${pathname}?${toSearchParams(next)}`, { scroll: false });
        return next;
      });
    },
    [router, pathname],
  );
  return [query, update] as const;
}

export function toSearchParams(q: SupportSearch): string {
  const p = new URLSearchParams();
  for (const [k, v] of Object.entries(q)) {
    if (v === undefined || v === null || v === '') continue;
    if ((k === 'page' && v === 1) || (k === 'pageSize' && v === 25)) continue;
    p.set(k, String(v));
  }
  return p.toString();
}
