import { badParam } from './api-error';
import type { FormObject, FormValue } from './form-body';

// Stripe's documented metadata limits: 50 keys, 40-character keys, 500-character values [mem].
const METADATA_MAX_KEYS = 50;
const METADATA_MAX_KEY_LENGTH = 40;
const METADATA_MAX_VALUE_LENGTH = 500;
const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** Refuses parameters the endpoint does not know, as Stripe does ("Received unknown parameter"). */
export function assertKnownParams(body: FormObject, allowed: readonly string[], prefix = ''): void {
  for (const key of Object.keys(body)) {
    if (!allowed.includes(key)) {
      const name = prefix ? `${prefix}[${key}]` : key;
      throw badParam(name, `Received unknown parameter: ${name}`, 'parameter_unknown');
    }
  }
}

/** The hash at `key`, or undefined; a string or list there is a 400. */
export function optionalHash(body: FormObject, key: string, param = key): FormObject | undefined {
  const value = body[key];
  if (value === undefined) return undefined;
  if (typeof value === 'string' || Array.isArray(value)) throw badParam(param, `Invalid ${param}: must be a hash.`);
  return value;
}

/** The list at `key`, or an empty list; a plain value or hash there is a 400. */
export function optionalList(body: FormObject, key: string, param = key): FormValue[] {
  const value = body[key];
  if (value === undefined) return [];
  if (!Array.isArray(value)) throw badParam(param, `Invalid ${param}: must be an array (${param}[0]=...).`);
  return value;
}

export function optionalString(body: FormObject, key: string, maxLength = 5000, param = key): string | undefined {
  const value = body[key];
  if (value === undefined) return undefined;
  if (typeof value !== 'string') throw badParam(param, `Invalid ${param}: must be a string.`);
  if (value.length > maxLength) throw badParam(param, `Invalid ${param}: must be at most ${maxLength} characters.`);
  return value;
}

export function requiredString(body: FormObject, key: string, maxLength = 5000, param = key): string {
  const value = optionalString(body, key, maxLength, param);
  if (value === undefined || value === '')
    throw badParam(param, `Missing required param: ${param}.`, 'parameter_missing');
  return value;
}

export function optionalInteger(
  body: FormObject,
  key: string,
  min: number,
  max: number,
  param = key,
): number | undefined {
  const value = optionalString(body, key, 20, param);
  if (value === undefined) return undefined;
  const n = Number(value);
  if (!/^-?\d+$/.test(value) || n < min || n > max) {
    throw badParam(param, `Invalid integer for ${param}: '${value}' (expected ${min} to ${max}).`);
  }
  return n;
}

export function optionalEmail(body: FormObject, key: string, param = key): string | undefined {
  const value = optionalString(body, key, 512, param);
  if (value === undefined || value === '') return undefined;
  if (!EMAIL_PATTERN.test(value)) throw badParam(param, `Invalid email address: ${value}`, 'email_invalid');
  return value;
}

/** An absolute http(s) URL; `{CHECKOUT_SESSION_ID}` braces are allowed through as Stripe allows them. */
export function optionalUrl(body: FormObject, key: string, param = key): string | undefined {
  const value = optionalString(body, key, 5000, param);
  if (value === undefined) return undefined;
  let url: URL;
  try {
    url = new URL(value);
  } catch {
    throw badParam(param, `Not a valid URL: ${param} must be an absolute URL, got '${value}'.`, 'url_invalid');
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') {
    throw badParam(param, `Not a valid URL: ${param} must use http or https.`, 'url_invalid');
  }
  return value;
}

/** Metadata as a flat string map; an empty value means "unset this key" on updates. */
export function optionalMetadata(body: FormObject, key: string, param = key): Record<string, string> | undefined {
  const hash = body[key] === '' ? {} : optionalHash(body, key, param);
  if (hash === undefined) return undefined;
  const entries = Object.entries(hash);
  if (entries.length > METADATA_MAX_KEYS) throw badParam(param, `Invalid ${param}: at most ${METADATA_MAX_KEYS} keys.`);
  const out: Record<string, string> = {};
  for (const [name, value] of entries) {
    if (typeof value !== 'string')
      throw badParam(`${param}[${name}]`, `Invalid ${param}[${name}]: metadata values must be strings.`);
    if (name.length > METADATA_MAX_KEY_LENGTH)
      throw badParam(
        `${param}[${name}]`,
        `Invalid ${param}: keys must be at most ${METADATA_MAX_KEY_LENGTH} characters.`,
      );
    if (value.length > METADATA_MAX_VALUE_LENGTH)
      throw badParam(
        `${param}[${name}]`,
        `Invalid ${param}[${name}]: values must be at most ${METADATA_MAX_VALUE_LENGTH} characters.`,
      );
    out[name] = value;
  }
  return out;
}
