'use server';

import { defineAction } from '@/lib/actions/define-action';
import { openBillingPortal, startCheckout } from '@/lib/billing/checkout';
import { checkoutSchema, emptySchema } from '@/lib/billing/schema';

export const startCheckoutAction = defineAction(
  { permission: 'billing:manage', schema: checkoutSchema, name: 'billing.start_checkout' },
  async (input, user) => startCheckout(user, input.plan),
);

export const openPortalAction = defineAction(
  { permission: 'billing:manage', schema: emptySchema, name: 'billing.open_portal' },
  async (_input, user) => openBillingPortal(user),
);
