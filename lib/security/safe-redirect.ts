// Where to send someone after signing in. The `next` parameter is parsed as a URL relative to the app's own
// base URL and must keep its origin; the path must also read plainly once decoded: no backslash (browsers treat
// "/\evil.example" as "//evil.example"), no control characters, no "//" at the start. Anything else lands on the desk.
export const DESK_PATH = '/size';

/** A same-origin path (with its query and fragment) to go to after sign-in, or `fallback` (the desk). */
export function safeNextPath(next: unknown, appUrl: string, fallback: string = DESK_PATH): string {
  const raw = Array.isArray(next) ? next[0] : next;
  if (typeof raw !== 'string' || !raw.startsWith('/') || raw.length > 2000) return fallback;
  let url: URL;
  try {
    url = new URL(raw, appUrl);
  } catch {
    return fallback;
  }
  if (url.origin !== new URL(appUrl).origin) return fallback;
  let decoded: string;
  try {
    decoded = decodeURIComponent(url.pathname);
  } catch {
    return fallback;
  }

  if (/[\\\u0000-\u001f\u007f]/.test(raw) || /[\\\u0000-\u001f\u007f]/.test(decoded) || decoded.startsWith('//'))
    return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
