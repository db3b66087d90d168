'use client';

import { useEffect } from 'react';
import type { SizingInput } from '@/lib/engine';
import { encodeShareParam } from '../_lib/share-link';

/** The desk marks URLs it wrote itself, so reloading them opens without the "shared link" notice. */
export const DESK_URL_MARK = 'desk';

/**
 * Keeps the desk's valid inputs in the address bar (replacing the entry, so Back leaves the desk as usual):
 * reload, Back and Forward, and sign-in or sign-up from here all bring the same inputs back. A saved sizing
 * being revised keeps its `sizing` and `revise` parameters beside them.
 */
export function useInputsInUrl(input: SizingInput | null, key: string | null) {
  useEffect(() => {
    if (!input) return;
    const timer = setTimeout(() => {
      let param: string;
      try {
        param = encodeShareParam(input);
      } catch {
        return; // longer than a link may carry: the previous inputs stay in the URL
      }
      const url = new URL(window.location.href);
      if (url.searchParams.get('i') === param) return;
      url.searchParams.set('i', param);
      url.searchParams.set('from', DESK_URL_MARK);
      window.history.replaceState(null, '', `${url.pathname}?${url.searchParams.toString()}`);
    }, 300);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the validated input's serialisation
  }, [key]);
}
