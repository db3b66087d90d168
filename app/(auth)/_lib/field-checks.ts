// The sign-in and sign-up forms' own checks, as the server's schemas (lib/auth/schema.ts) state them, without
// shipping zod to these pages: the server parses every submission again and stays the authority.

/** An address of the shape the server accepts: no leading or doubled dots, a dotted domain ending in letters. */
const EMAIL = /^(?!\.)(?!.*\.\.)[A-Za-z0-9_'+.-]*[A-Za-z0-9_+-]@([A-Za-z0-9][A-Za-z0-9-]*\.)+[A-Za-z]{2,}$/;
// bcrypt reads 72 bytes of a password (lib/auth/schema.ts).
const PASSWORD_MAX_BYTES = 72;
const CONTROL = /[\u0000-\u001f\u007f]/;

export type FieldErrors = Partial<Record<string, string>>;

const emailError = (v: string, message: string) => (EMAIL.test(v) && v.length <= 254 ? undefined : message);

function nameError(raw: string, what: string, min: number, max: number): string | undefined {
  const v = raw.trim();
  if (v.length < min || v.length > max) return `Enter ${what} (${min} to ${max} characters).`;
  if (CONTROL.test(v)) return `${what} cannot hold line breaks or tabs.`;
  return undefined;
}

function newPasswordError(p: string): string | undefined {
  if (p.length < 10) return 'Use at least 10 characters.';
  if (p.length > 200) return 'Use at most 72 bytes (about 72 plain letters and digits).';
  if (new TextEncoder().encode(p).byteLength > PASSWORD_MAX_BYTES)
    return 'Use at most 72 bytes (about 72 plain letters and digits; accented letters count double).';
  return undefined;
}

export function signInErrors(v: Record<string, string>): FieldErrors {
  return {
    email: emailError(v.email ?? '', 'Enter the e-mail address you sign in with.'),
    password: !v.password
      ? 'Enter your password.'
      : v.password.length > 200
        ? 'Use at most 200 characters.'
        : undefined,
  };
}

export function signUpErrors(v: Record<string, string>): FieldErrors {
  return {
    name: nameError(v.name ?? '', 'your name', 2, 100),
    email: emailError(v.email ?? '', 'Enter a valid e-mail address.'),
    password: newPasswordError(v.password ?? ''),
    company: nameError(v.company ?? '', 'your company name', 2, 120),
    site: (v.site ?? '').trim().length > 120 ? 'Use at most 120 characters.' : undefined,
  };
}
