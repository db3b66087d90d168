import { env } from '@/lib/env';
import { safeNextPath } from '@/lib/security/safe-redirect';

/**
 * A `next` parameter as a same-site path, or undefined: another origin, or a backslash or control-character
 * trick, would be an open redirect (lib/security/safe-redirect.ts).
 */
export function safeNextParam(next: string | string[] | undefined): string | undefined {
  return safeNextPath(next, env.APP_URL, '') || undefined;
}

/** A link to another auth page that carries `next` along. */
export function withNext(path: string, next: string | undefined): string {
  return next ? `${path}?next=${encodeURIComponent(next)}` : path;
}
