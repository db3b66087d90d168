// The e-mails Dutywise sends, their props and subject lines. Bodies are React templates in emails/.
// Fields ending in Url are absolute, or app paths such as /billing that rendering resolves against APP_URL.
export type EmailProps = {
  invitation: { accountName: string; inviterName: string; inviteUrl: string; expiresInDays: number };
  'quote-sent': {
    accountName: string;
    quoteNumber: string;
    quoteTitle: string;
    senderName: string;
    quoteUrl: string;
    /** An invitation to join the account, for a billing contact with no Dutywise sign-in yet. */
    joinUrl?: string | null;
    lines: { title: string; tag: string | null; headline: string; quantity: number; price?: string | null }[];
    total?: string | null;
  };
  'datasheet-issued': {
    accountName: string;
    datasheetNumber: string;
    revision: string;
    sizingTitle: string;
    equipmentTag: string | null;
    datasheetUrl: string;
    /** Set when support re-sends the notice: the subject and body say it is a copy. */
    copy?: boolean;
    /** The later revision that replaces this one, when a superseded revision is re-sent. */
    supersededBy?: string | null;
  };
  'payment-failed': { accountName: string; billingUrl: string; graceDays: number };
  'subscription-ending': { accountName: string; periodEnd: string; billingUrl: string };
  'verify-email': { name: string; verifyUrl: string; expiresInHours: number };
  'password-reset': { resetUrl: string; expiresInMinutes: number };
  'account-exists': { signInUrl: string; resetUrl: string };
};

export type EmailTemplate = keyof EmailProps;

export const emailTemplates = [
  'invitation',
  'quote-sent',
  'datasheet-issued',
  'payment-failed',
  'subscription-ending',
  'verify-email',
  'password-reset',
  'account-exists',
] as const satisfies readonly EmailTemplate[];

export function subjectFor<T extends EmailTemplate>(template: T, props: EmailProps[T]): string {
  switch (template) {
    case 'invitation': {
      const p = props as EmailProps['invitation'];
      return `You are invited to ${p.accountName} on Dutywise`;
    }
    case 'quote-sent': {
      const p = props as EmailProps['quote-sent'];
      return `Quote ${p.quoteNumber}: ${p.quoteTitle}`;
    }
    case 'datasheet-issued': {
      const p = props as EmailProps['datasheet-issued'];
      const base = `Datasheet ${p.datasheetNumber} rev. ${p.revision}`;
      if (!p.copy) return `${base} issued`;
      return `Copy: ${base}${p.supersededBy ? ` (superseded by rev. ${p.supersededBy})` : ''}`;
    }
    case 'payment-failed':
      return 'Dutywise subscription payment failed';
    case 'subscription-ending': {
      const p = props as EmailProps['subscription-ending'];
      return `Your Dutywise subscription ends on ${p.periodEnd}`;
    }
    case 'verify-email':
      return 'Confirm your e-mail address for Dutywise';
    case 'password-reset':
      return 'Choose a new Dutywise password';
    case 'account-exists':
      return 'You already have a Dutywise sign-in';
    default:
      throw new Error(`unknown e-mail template ${String(template)}`);
  }
}
