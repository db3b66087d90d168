import { env } from '@/lib/env';

/**
 * Every limit the app applies, by name: how many points a key may spend per window. Keys say whose budget it is
 * (a client address, an account, a user, an e-mail address); lib/ratelimit/limit.ts spends them.
 * Sign-in failures are counted separately with a back-off (lib/ratelimit/sign-in-guard.ts).
 */
export type Policy = {
  points: number;
  durationS: number;
  /** When the shared store is unreachable: let the request through (true) or refuse it (false). */
  failOpen?: boolean;
};

const perHour = (points: number): Policy => ({ points, durationS: 3600 });

export const policies = {
  // The public calculate API, per client address; a database fault must not turn into an outage of the API.
  calculate: { points: env.RATE_LIMIT_CALCULATE_PER_MIN, durationS: 60, failOpen: true },
  // Sign-in attempts per client address.
  'sign-in': { points: env.RATE_LIMIT_SIGN_IN_PER_MIN, durationS: 60 },
  // Public forms, per client address: each form has its own budget.
  'sign-up': perHour(env.RATE_LIMIT_PUBLIC_FORMS_PER_HOUR),
  'invite-accept': perHour(env.RATE_LIMIT_PUBLIC_FORMS_PER_HOUR),
  'password-reset': perHour(env.RATE_LIMIT_PUBLIC_FORMS_PER_HOUR),
  'verify-resend': perHour(env.RATE_LIMIT_PUBLIC_FORMS_PER_HOUR),
  // Mail the public forms cause, per recipient address, so nobody can flood someone else's inbox.
  'mail-to-address': perHour(env.RATE_LIMIT_MAIL_PER_ADDRESS_PER_HOUR),
  // Invitations sent, per inviting user and per account invited into.
  'invite.user': { points: env.RATE_LIMIT_INVITES_PER_DAY, durationS: 86_400 },
  'invite.account': { points: env.RATE_LIMIT_INVITES_PER_DAY * 2, durationS: 86_400 },
  // Datasheet revisions issued, per issuing user and per account.
  'datasheet.user': perHour(env.RATE_LIMIT_DATASHEETS_PER_HOUR),
  'datasheet.account': perHour(env.RATE_LIMIT_DATASHEETS_PER_HOUR * 2),
  // Batch uploads (checks and saves), per account.
  'batch.account': perHour(env.RATE_LIMIT_BATCH_PER_HOUR),
} satisfies Record<string, Policy>;

export type PolicyName = keyof typeof policies;
