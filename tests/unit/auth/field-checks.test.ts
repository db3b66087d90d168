// The sign-in and sign-up pages check their fields without zod; each check must agree with the server's schema
// (lib/auth/schema.ts), which parses every submission again: same verdict, and the same message where the schema
// words one.
import { describe, expect, it } from 'vitest';
import { signInErrors, signUpErrors } from '@/app/(auth)/_lib/field-checks';
import { signInSchema, signUpSchema } from '@/lib/auth/schema';

const good = {
  name: 'Wren Albright',
  email: 'wren@saltmarsh.example',
  password: 'brine-pump-2026',
  company: 'Saltmarsh',
  site: '',
};

function schemaMessages(schema: typeof signUpSchema | typeof signInSchema, values: Record<string, string>) {
  const r = schema.safeParse(values);
  const out: Record<string, string> = {};
  if (!r.success) for (const i of r.error.issues) out[String(i.path[0])] ??= i.message;
  return out;
}
const defined = (e: Record<string, string | undefined>) =>
  Object.fromEntries(Object.entries(e).filter(([, v]) => v !== undefined));

describe('sign-up field checks agree with the server schema', () => {
  const cases: [string, Record<string, string>][] = [
    ['a valid form', {}],
    ['a one-letter name', { name: 'W' }],
    ['a name of spaces', { name: '   ' }],
    ['a name with a tab', { name: 'Wren\tAlbright' }],
    ['an address without a domain', { email: 'wren@' }],
    ['an address with doubled dots', { email: 'wren..a@saltmarsh.example' }],
    ['a nine-character password', { password: 'ninechars' }],
    ['a password over 72 bytes', { password: 'é'.repeat(40) }],
    ['a password over 200 characters', { password: 'x'.repeat(201) }],
    ['a company of one letter', { company: 'S' }],
    ['a site over 120 characters', { site: 's'.repeat(121) }],
  ];
  it.each(cases)('%s', (_, change) => {
    const values = { ...good, ...change };
    const server = schemaMessages(signUpSchema, values);
    const client = defined(signUpErrors(values));
    expect(Object.keys(client).sort()).toEqual(Object.keys(server).sort());
    // The site's length message is the form's own wording; the schema keeps zod's default there.
    for (const k of Object.keys(client)) if (k !== 'site') expect(client[k]).toBe(server[k]);
  });
});

describe('sign-in field checks agree with the server schema', () => {
  const cases: [string, Record<string, string>][] = [
    ['a valid form', { email: 'wren@saltmarsh.example', password: 'x' }],
    ['no password', { email: 'wren@saltmarsh.example', password: '' }],
    ['no address', { email: '', password: 'x' }],
    ['an address without a dot in its domain', { email: 'wren@saltmarsh', password: 'x' }],
  ];
  it.each(cases)('%s', (_, values) => {
    expect(defined(signInErrors(values))).toEqual(schemaMessages(signInSchema, values));
  });
});
