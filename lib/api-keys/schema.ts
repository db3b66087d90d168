import * as z from 'zod/mini';
import '@/lib/validation/english-messages';

/** The most requests a minute one key may be given, and what a new key gets unless its creator says otherwise. */
export const API_KEY_MAX_PER_MINUTE = 1000;
export const API_KEY_DEFAULT_PER_MINUTE = 300;
/** Active keys per customer account, or per staff member. */
export const API_KEY_ACTIVE_LIMIT = 10;

const limitWords = `The limit must be 1 to ${API_KEY_MAX_PER_MINUTE} requests a minute.`;

/** What the create form and action send. */
export const apiKeyCreateSchema = z.object({
  name: z
    .string({ message: 'Name the key after the tool that will use it.' })
    .check(
      z.trim(),
      z.minLength(1, { message: 'Name the key after the tool that will use it (1 to 80 characters).' }),
      z.maxLength(80, { message: 'The name is limited to 80 characters.' }),
    ),
  perMinute: z._default(
    z.coerce
      .number({ message: 'The limit is a whole number of requests a minute.' })
      .check(
        z.refine(Number.isInteger, { message: 'The limit is a whole number of requests a minute.' }),
        z.gte(1, { message: limitWords }),
        z.lte(API_KEY_MAX_PER_MINUTE, { message: limitWords }),
      ),
    API_KEY_DEFAULT_PER_MINUTE,
  ),
});
export type ApiKeyCreateInput = z.output<typeof apiKeyCreateSchema>;

export const apiKeyRevokeSchema = z.object({ keyId: z.uuid({ message: 'Choose a key to revoke.' }) });
