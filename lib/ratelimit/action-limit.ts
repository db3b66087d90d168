import 'server-only';
import { headers } from 'next/headers';
import { clientKey } from './client';
import { enforce } from './limit';
import type { PolicyName } from './policies';

/** For public server actions (sign-up, invitation, password reset): throws a 429 AppError past the address's budget. */
export async function limitPublicAction(name: PolicyName, what = 'attempts'): Promise<void> {
  await enforce(what, [name, clientKey(await headers())]);
}
