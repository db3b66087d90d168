/** A `next` parameter as a same-site path, or undefined: an absolute or protocol-relative URL would be an open redirect. */
export function safeNextParam(next: string | string[] | undefined): string | undefined {
  const value = Array.isArray(next) ? next[0] : next;
  return value && value.startsWith('/') && !value.startsWith('//') && !value.includes('\\') ? value : undefined;
}

/** A link to another auth page that carries `next` along. */
export function withNext(path: string, next: string | undefined): string {
  return next ? `${path}?next=${encodeURIComponent(next)}` : path;
}
