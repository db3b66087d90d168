import { z } from 'zod';

// bcrypt reads 72 bytes of a password; a longer one is refused rather than silently cut (lib/auth/local/passwords.ts).
const PASSWORD_MAX_BYTES = 72;

/** A new password: 10 characters to 72 bytes (about 72 letters, fewer with accents or symbols beyond ASCII). */
export const newPasswordSchema = z
  .string()
  .min(10, { message: 'Use at least 10 characters.' })
  .max(200, { message: 'Use at most 72 bytes (about 72 plain letters and digits).' })
  .refine((p) => new TextEncoder().encode(p).byteLength <= PASSWORD_MAX_BYTES, {
    message: 'Use at most 72 bytes (about 72 plain letters and digits; accented letters count double).',
  });

/** A person's or company's name as typed: trimmed, no control characters. */
export const nameText = (what: string, min: number, max: number) =>
  z
    .string()
    .trim()
    .min(min, { message: `Enter ${what} (${min} to ${max} characters).` })
    .max(max, { message: `Enter ${what} (${min} to ${max} characters).` })

    .refine((v) => !/[\u0000-\u001f\u007f]/.test(v), { message: `${what} cannot hold line breaks or tabs.` });

export const signInSchema = z.object({
  email: z.email({ message: 'Enter the e-mail address you sign in with.' }).max(254),
  password: z.string().min(1, { message: 'Enter your password.' }).max(200),
  next: z.string().max(2000).optional(),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z.object({
  name: nameText('your name', 2, 100),
  email: z.email({ message: 'Enter a valid e-mail address.' }).max(254),
  password: newPasswordSchema,
  company: nameText('your company name', 2, 120),
  site: z.string().trim().max(120).optional(),
  // The page to open after the address is confirmed and the person signs in (a desk link keeps its inputs).
  next: z.string().max(2000).optional(),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const forgotPasswordSchema = z.object({
  email: z.email({ message: 'Enter the e-mail address you sign in with.' }).max(254),
});

/** A one-time token from a mailed link: base64url, as lib/auth/local/email-tokens.ts makes them. */
export const mailedTokenSchema = z
  .string()
  .regex(/^[A-Za-z0-9_-]{32,64}$/, { message: 'This link is incomplete; open it again from the e-mail.' });

export const resetPasswordSchema = z.object({ token: mailedTokenSchema, password: newPasswordSchema });
