import * as z from 'zod/mini';
import '@/lib/validation/english-messages';
import type { UserRole } from '@/lib/auth/roles';

// Listed here rather than imported from the database enum so this schema stays light in the browser;
// the Record type fails to compile if a role is added to the enum and not here.
const roleSet: Record<UserRole, true> = { sales_engineer: true, customer: true, support: true, admin: true };
const userRoles = Object.keys(roleSet) as [UserRole, ...UserRole[]];

/** Roles an admin can move a person between; customers belong to an account and keep their role. */
export const staffRoleValues = ['sales_engineer', 'support', 'admin'] as const;

export const userRoleChangeSchema = z.object({
  userId: z.uuid({ message: 'Choose a user.' }),
  role: z.enum(userRoles, { message: `Role must be one of: ${userRoles.join(', ')}.` }),
});
export type UserRoleChangeInput = z.output<typeof userRoleChangeSchema>;

export const userDisableSchema = z.object({
  userId: z.uuid({ message: 'Choose a user.' }),
  disabled: z.boolean({ message: 'Say whether the user is disabled (true) or enabled (false).' }),
});
export type UserDisableInput = z.output<typeof userDisableSchema>;

export const unitSystemSchema = z.object({
  unitSystem: z.enum(['si', 'us'], { error: 'Unit system must be "si" or "us".' }),
});
export type UnitSystemInput = z.output<typeof unitSystemSchema>;

export const staffInviteSchema = z.object({
  email: z.email({ message: 'Enter a valid e-mail address.' }).check(z.maxLength(254)),
  role: z.enum(staffRoleValues, { message: 'Choose sales engineer, support or admin.' }),
});
export type StaffInviteInput = z.output<typeof staffInviteSchema>;

/** The people page's search, from the URL. */
export const peopleSearchSchema = z.object({
  q: z.catch(z.optional(z.string().check(z.trim(), z.maxLength(100))), undefined),
});
