import bcrypt from 'bcryptjs';

// bcrypt cost 10: about 60 ms a check on this class of machine, enough to slow guessing
// without making sign-in feel slow. Rate limiting on sign-in does the rest.
const COST = 10;

/** bcrypt reads at most 72 bytes of a password; longer ones are refused when set, never silently cut. */
export const PASSWORD_MAX_BYTES = 72;

export function passwordBytes(plain: string): number {
  return new TextEncoder().encode(plain).byteLength;
}

export function hashPassword(plain: string): Promise<string> {
  if (passwordBytes(plain) > PASSWORD_MAX_BYTES) throw new Error('password longer than bcrypt reads');
  return bcrypt.hash(plain, COST);
}

let decoy: string | undefined;

export function verifyPassword(plain: string, hash: string | null): Promise<boolean> {
  // Compare against a decoy hash when the user has none, so timing does not reveal which e-mails exist.
  decoy ??= bcrypt.hashSync('dutywise-decoy', COST);
  return bcrypt.compare(plain, hash ?? decoy).then((ok) => ok && hash !== null);
}
