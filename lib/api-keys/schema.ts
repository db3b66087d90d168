import { z } from 'zod';

/** The most requests a minute one key may be given, and what a new key gets unless its creator says otherwise. */
export const API_KEY_MAX_PER_MINUTE = 1000;
export const API_KEY_DEFAULT_PER_MINUTE = 300;
/** Active keys per customer account, or per staff member. */
export const API_KEY_ACTIVE_LIMIT = 10;

/** What the create form and action send. */
export const apiKeyCreateSchema = z.object({
  name: z
    .string({ message: 'Name the key after the tool that will use it.' })
    .trim()
    .min(1, { message: 'Name the key after the tool that will use it (1 to 80 characters).' })
    .max(80, { message: 'The name is limited to 80 characters.' }),
  perMinute: z.coerce
    .number({ message: 'The limit is a whole number of requests a minute.' })
    .int({ message: 'The limit is a whole number of requests a minute.' })
    .min(1, { message: `The limit must be 1 to ${API_KEY_MAX_PER_MINUTE} requests a minute.` })
    .max(API_KEY_MAX_PER_MINUTE, { message: `The limit must be 1 to ${API_KEY_MAX_PER_MINUTE} requests a minute.` })
    .default(API_KEY_DEFAULT_PER_MINUTE),
});
export type ApiKeyCreateInput = z.output<typeof apiKeyCreateSchema>;

export const apiKeyRevokeSchema = z.object({ keyId: z.uuid({ message: 'Choose a key to revoke.' }) });
