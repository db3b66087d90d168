import { z } from 'zod';

export const checkoutSchema = z.object({
  plan: z.enum(['monthly', 'annual'], { message: 'Choose the monthly or the annual plan.' }),
});
export const emptySchema = z.object({}).passthrough();
