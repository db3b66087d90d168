import { sizingRequestSchema, type SizingInput, type SizingRequest } from '@/lib/engine/schema';
import { issuesOf } from '@/lib/errors';

/** Longest `i` parameter accepted: a request is a few hundred bytes; anything far larger is not ours. */
export const MAX_SHARE_PARAM_CHARS = 4096;
// A version prefix lets a later format be told apart from this one.
const PREFIX = '1.';

export type ShareDecode = { ok: true; input: SizingInput } | { ok: false; reason: string };

function toBase64Url(text: string): string {
  let binary = '';
  for (const byte of new TextEncoder().encode(text)) binary += String.fromCharCode(byte);
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

function fromBase64Url(text: string): string {
  if (!/^[A-Za-z0-9_-]*$/.test(text)) throw new Error('not base64url');
  const binary = atob(text.replace(/-/g, '+').replace(/_/g, '/') + '='.repeat((4 - (text.length % 4)) % 4));
  const bytes = Uint8Array.from(binary, (c) => c.charCodeAt(0));
  return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
}

/** The `i` parameter that reopens these inputs: versioned base64url of the request's JSON. */
export function encodeShareParam(request: SizingRequest | SizingInput): string {
  const param = PREFIX + toBase64Url(JSON.stringify(request));
  if (param.length > MAX_SHARE_PARAM_CHARS)
    throw new Error(`share link would be ${param.length} characters; the limit is ${MAX_SHARE_PARAM_CHARS}`);
  return param;
}

/** Reads an `i` parameter back, refusing anything oversized, garbled or not a valid sizing request. */
export function decodeShareParam(param: string): ShareDecode {
  if (param.length > MAX_SHARE_PARAM_CHARS)
    return { ok: false, reason: `the link's inputs are longer than ${MAX_SHARE_PARAM_CHARS} characters` };
  if (!param.startsWith(PREFIX))
    return { ok: false, reason: 'the link was not made by this sizing desk (unknown format)' };
  let json: unknown;
  try {
    json = JSON.parse(fromBase64Url(param.slice(PREFIX.length)));
  } catch {
    return { ok: false, reason: 'the link is damaged (it does not decode); copy it again in full' };
  }
  const parsed = sizingRequestSchema.safeParse(json);
  if (!parsed.success) {
    const first = issuesOf(parsed.error)[0];
    return {
      ok: false,
      reason: `the link's inputs are not a valid sizing${first ? ` (${first.path || 'request'}: ${first.message})` : ''}`,
    };
  }
  return { ok: true, input: parsed.data };
}

/** The path that reopens a request on the desk. */
export function sharePath(request: SizingRequest | SizingInput): string {
  return `/size?i=${encodeShareParam(request)}`;
}
