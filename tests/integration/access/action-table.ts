import type { UserRole } from '@/db/schema/enums';

// Who may call each server action: the specification the matrix test holds the code to.
// 'public' actions accept signed-out callers. Every export of every app/**/actions.ts needs a row.
export type ActionAccess = { allowed: readonly UserRole[] | 'public'; skip?: 'redirects' };

const staffWrite = ['sales_engineer', 'admin'] as const;
const everyone = ['sales_engineer', 'customer', 'support', 'admin'] as const;

export const actionTable: Record<string, ActionAccess> = {
  'app/(auth)/invite/[token]/actions.ts#acceptInviteAction': { allowed: 'public' },
  'app/(auth)/sign-in/actions.ts#signOutAction': { allowed: 'public', skip: 'redirects' },
  'app/(auth)/sign-up/actions.ts#signUpAction': { allowed: 'public' },
  'app/(auth)/verify/[token]/actions.ts#verifyEmailAction': { allowed: 'public' },
  'app/(auth)/forgot-password/actions.ts#requestPasswordResetAction': { allowed: 'public' },
  'app/(auth)/reset-password/[token]/actions.ts#resetPasswordAction': { allowed: 'public' },
  'app/(desk)/accounts/actions.ts#createAccountAction': { allowed: staffWrite },
  'app/(desk)/accounts/[accountId]/actions.ts#updateAccountAction': { allowed: staffWrite },
  'app/(desk)/accounts/[accountId]/actions.ts#inviteMemberAction': { allowed: ['sales_engineer', 'customer', 'admin'] },
  'app/(desk)/admin/actions.ts#changeUserRoleAction': { allowed: ['admin'] },
  'app/(desk)/admin/actions.ts#setUserDisabledAction': { allowed: ['admin'] },
  'app/(desk)/admin/actions.ts#inviteStaffAction': { allowed: ['admin'] },
  'app/(desk)/billing/actions.ts#startCheckoutAction': { allowed: ['customer'] },
  'app/(desk)/billing/actions.ts#openPortalAction': { allowed: ['customer'] },
  'app/(desk)/quotes/new/actions.ts#createQuoteAction': { allowed: staffWrite },
  'app/(desk)/quotes/[quoteId]/actions.ts#addQuoteLineAction': { allowed: staffWrite },
  'app/(desk)/quotes/[quoteId]/actions.ts#removeQuoteLineAction': { allowed: staffWrite },
  'app/(desk)/quotes/[quoteId]/actions.ts#setQuoteLinePriceAction': { allowed: staffWrite },
  'app/(desk)/quotes/[quoteId]/actions.ts#setQuoteStatusAction': { allowed: staffWrite },
  'app/(desk)/quotes/[quoteId]/actions.ts#sendQuoteAction': { allowed: staffWrite },
  'app/(desk)/quotes/[quoteId]/actions.ts#bindQuotePdfAction': { allowed: staffWrite },
  'app/(desk)/size/actions.ts#saveSizingAction': { allowed: ['sales_engineer', 'customer', 'admin'] },
  'app/(desk)/size/actions.ts#setUnitSystemAction': { allowed: everyone },
  'app/(desk)/sizings/[sizingId]/actions.ts#resendDatasheetEmailAction': { allowed: ['support', 'admin'] },
  'app/(desk)/datasheets/actions.ts#issueDatasheetAction': { allowed: staffWrite },
  'app/(desk)/api-keys/actions.ts#createApiKeyAction': { allowed: everyone },
  'app/(desk)/api-keys/actions.ts#revokeApiKeyAction': { allowed: everyone },
};
