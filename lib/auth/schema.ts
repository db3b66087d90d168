import * as z from 'zod/mini';
import '@/lib/validation/english-messages';

// bcrypt reads 72 bytes of a password; a longer one is refused rather than silently cut (lib/auth/local/passwords.ts).
const PASSWORD_MAX_BYTES = 72;

/** A new password: 10 characters to 72 bytes (about 72 letters, fewer with accents or symbols beyond ASCII). */
export const newPasswordSchema = z.string().check(
  z.minLength(10, { message: 'Use at least 10 characters.' }),
  z.maxLength(200, { message: 'Use at most 72 bytes (about 72 plain letters and digits).' }),
  z.refine((p) => new TextEncoder().encode(p).byteLength <= PASSWORD_MAX_BYTES, {
    message: 'Use at most 72 bytes (about 72 plain letters and digits; accented letters count double).',
  }),
);

/** A person's or company's name as typed: trimmed, no control characters. */
export const nameText = (what: string, min: number, max: number) =>
  z.string().check(
    z.trim(),
    z.minLength(min, { message: `Enter ${what} (${min} to ${max} characters).` }),
    z.maxLength(max, { message: `Enter ${what} (${min} to ${max} characters).` }),
    z.refine((v) => !/[\u0000-\u001f\u007f]/.test(v), { message: `${what} cannot hold line breaks or tabs.` }),
  );

export const signInSchema = z.object({
  email: z.email({ message: 'Enter the e-mail address you sign in with.' }).check(z.maxLength(254)),
  password: z.string().check(z.minLength(1, { message: 'Enter your password.' }), z.maxLength(200)),
  next: z.optional(z.string().check(z.maxLength(2000))),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z.object({
  name: nameText('your name', 2, 100),
  email: z.email({ message: 'Enter a valid e-mail address.' }).check(z.maxLength(254)),
  password: newPasswordSchema,
  company: nameText('your company name', 2, 120),
  site: z.optional(z.string().check(z.trim(), z.maxLength(120))),
  // The page to open after the address is confirmed and the person signs in (a desk link keeps its inputs).
  next: z.optional(z.string().check(z.maxLength(2000))),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const forgotPasswordSchema = z.object({
  email: z.email({ message: 'Enter the e-mail address you sign in with.' }).check(z.maxLength(254)),
});

/** A one-time token from a mailed link: base64url, as lib/auth/local/email-tokens.ts makes them. */
export const mailedTokenSchema = z
  .string()
  .check(z.regex(/^[A-Za-z0-9_-]{32,64}$/, { message: 'This link is incomplete; open it again from the e-mail.' }));

export const resetPasswordSchema = z.object({ token: mailedTokenSchema, password: newPasswordSchema });
