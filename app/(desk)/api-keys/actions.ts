'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { createApiKey, revokeApiKey } from '@/lib/api-keys/mutations';
import { apiKeyCreateSchema, apiKeyRevokeSchema } from '@/lib/api-keys/schema';

/** Creates a named key with its own limit; the answer carries the key, shown this once and never again. */
export const createApiKeyAction = defineAction(
  { permission: 'apikey:manage', schema: apiKeyCreateSchema, name: 'api_key.create' },
  async (input, user) => {
    const made = await createApiKey(user, input);
    revalidatePath('/api-keys');
    return made;
  },
);

/** Revokes a key: its next request is refused with 401. */
export const revokeApiKeyAction = defineAction(
  { permission: 'apikey:manage', schema: apiKeyRevokeSchema, name: 'api_key.revoke' },
  async (input, user) => {
    const revoked = await revokeApiKey(user, input.keyId);
    revalidatePath('/api-keys');
    return revoked;
  },
);
