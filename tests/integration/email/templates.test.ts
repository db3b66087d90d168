import { describe, expect, it } from 'vitest';
import { preliminaryStatement } from '@/emails/_layout';
import type { EmailProps, EmailTemplate } from '@/lib/email/catalogue';
import { EmailInputError } from '@/lib/email/props-schema';
import { renderEmail } from '@/lib/email/render';

const appUrl = 'https://desk.dutywise.test';

// Props with facts that appear nowhere in the templates themselves, so a match proves they flowed through.
const cases: {
  [T in EmailTemplate]: { props: EmailProps[T]; facts: string[]; subject: string; engineering: boolean };
} = {
  invitation: {
    props: {
      accountName: 'Quorrel Compression Co-op',
      inviterName: 'Ilse Marrow',
      inviteUrl: `${appUrl}/invite/tok-7781`,
      expiresInDays: 9,
    },
    facts: ['Quorrel Compression Co-op', 'Ilse Marrow', `${appUrl}/invite/tok-7781`, '9 days'],
    subject: 'You are invited to Quorrel Compression Co-op on Dutywise',
    engineering: false,
  },
  'quote-sent': {
    props: {
      accountName: 'Quorrel Compression Co-op',
      quoteNumber: 'Q-9931',
      quoteTitle: 'Booster for pad 4',
      senderName: 'Ilse Marrow',
      quoteUrl: `${appUrl}/quotes/q-9931`,
      lines: [
        {
          title: 'Recycle booster',
          tag: 'K-4401',
          headline: '233 kW shaft power',
          quantity: 2,
          price: 'CHF 81,406.00',
        },
        { title: 'Start-up heater', tag: null, headline: '57.5 kW duty', quantity: 1 },
      ],
      total: 'CHF 81,406.00 for the 1 priced line (1 not priced)',
    },
    facts: [
      'Q-9931',
      'Booster for pad 4',
      'Ilse Marrow',
      'K-4401',
      '233 kW shaft power',
      'Start-up heater',
      '57.5 kW duty',
      'Price: CHF 81,406.00',
      'Total price',
      'CHF 81,406.00 for the 1 priced line (1 not priced)',
      `${appUrl}/quotes/q-9931`,
    ],
    subject: 'Quote Q-9931: Booster for pad 4',
    engineering: true,
  },
  'datasheet-issued': {
    props: {
      accountName: 'Quorrel Compression Co-op',
      datasheetNumber: 'DS-5520',
      revision: 'C',
      sizingTitle: 'Line heater, inlet',
      equipmentTag: 'E-118',
      datasheetUrl: `${appUrl}/datasheets/ds-5520`,
    },
    facts: ['DS-5520', 'Line heater, inlet', 'E-118', `${appUrl}/datasheets/ds-5520`],
    subject: 'Datasheet DS-5520 rev. C issued',
    engineering: true,
  },
  'payment-failed': {
    props: { accountName: 'Quorrel Compression Co-op', billingUrl: `${appUrl}/billing?from=mail-31`, graceDays: 11 },
    facts: ['Quorrel Compression Co-op', '11 days', `${appUrl}/billing?from=mail-31`],
    subject: 'Dutywise subscription payment failed',
    engineering: false,
  },
  'subscription-ending': {
    props: {
      accountName: 'Quorrel Compression Co-op',
      periodEnd: '2031-04-17',
      billingUrl: `${appUrl}/billing?from=mail-32`,
    },
    facts: ['Quorrel Compression Co-op', '2031-04-17', `${appUrl}/billing?from=mail-32`],
    subject: 'Your Dutywise subscription ends on 2031-04-17',
    engineering: false,
  },
  'verify-email': {
    props: { name: 'Ilse Marrow', verifyUrl: `${appUrl}/verify/tok-8812`, expiresInHours: 37 },
    facts: ['Ilse Marrow', `${appUrl}/verify/tok-8812`, '37 hours'],
    subject: 'Confirm your e-mail address for Dutywise',
    engineering: false,
  },
  'password-reset': {
    props: { resetUrl: `${appUrl}/reset-password/tok-8813`, expiresInMinutes: 43 },
    facts: [`${appUrl}/reset-password/tok-8813`, '43 minutes'],
    subject: 'Choose a new Dutywise password',
    engineering: false,
  },
  'account-exists': {
    props: { signInUrl: `${appUrl}/sign-in?from=mail-9`, resetUrl: `${appUrl}/forgot-password?from=mail-9` },
    facts: [`${appUrl}/sign-in?from=mail-9`, `${appUrl}/forgot-password?from=mail-9`],
    subject: 'You already have a Dutywise sign-in',
    engineering: false,
  },
};

// Text is compared with whitespace collapsed: the plain-text converter wraps long lines.
const flat = (s: string) => s.replace(/\s+/g, ' ');
const unescape = (s: string) =>
  s
    .replace(/&amp;/g, '&')
    .replace(/&quot;/g, '"')
    .replace(/&#x27;|&#39;/g, "'");

describe('e-mail templates', () => {
  for (const [template, c] of Object.entries(cases) as [EmailTemplate, (typeof cases)[EmailTemplate]][]) {
    it(`${template}: subject, HTML and plain text carry the key facts`, async () => {
      const out = await renderEmail(template, c.props, appUrl);
      expect(out.subject).toBe(c.subject);
      expect(out.html).toMatch(/^<!DOCTYPE html/i);
      expect(out.text).not.toMatch(/<[a-z]/i);
      for (const fact of c.facts) {
        expect(unescape(out.html)).toContain(fact);
        expect(flat(out.text)).toContain(fact);
      }
      // Dutywise's look: paper background and teal action button (the brand colours, inline for mail clients).
      expect(out.html).toContain('#f6f4ef');
      expect(out.html).toContain('#16565d');
    });

    it(`${template}: ${c.engineering ? 'carries' : 'does not need'} the preliminary-sizing statement`, async () => {
      const out = await renderEmail(template, c.props, appUrl);
      expect(flat(out.text).includes(preliminaryStatement)).toBe(c.engineering);
      expect(unescape(out.html).includes(preliminaryStatement)).toBe(c.engineering);
    });
  }

  it('spells revision and tag in the datasheet mail and omits the tag row when there is none', async () => {
    const base = cases['datasheet-issued'].props;
    const withTag = await renderEmail('datasheet-issued', base, appUrl);
    expect(flat(withTag.text)).toMatch(/Revision: C/);
    const noTag = await renderEmail('datasheet-issued', { ...base, equipmentTag: null }, appUrl);
    expect(noTag.text).not.toContain('Equipment tag');
  });

  it('invites a quote recipient with no sign-in through the join link instead of the plain quote link', async () => {
    const base = cases['quote-sent'].props;
    const joinUrl = `${appUrl}/invite/tok-5512?next=%2Fquotes%2Fq-9931`;
    const out = await renderEmail('quote-sent', { ...base, joinUrl }, appUrl);
    expect(unescape(out.html)).toContain(`href="${joinUrl}"`);
    expect(flat(out.text)).toContain(`Join ${base.accountName} and open the quote`);
    expect(flat(out.text)).toContain('no Dutywise sign-in yet');
    expect(out.html).not.toContain(`href="${appUrl}/quotes/q-9931"`);
    const plain = await renderEmail('quote-sent', base, appUrl);
    expect(plain.text).not.toContain('Join');
  });

  it('leaves prices out of a quote mail whose lines have none', async () => {
    const base = cases['quote-sent'].props;
    const unpriced = await renderEmail(
      'quote-sent',
      { ...base, lines: base.lines.map((l) => ({ ...l, price: null })), total: null },
      appUrl,
    );
    expect(unpriced.text).not.toMatch(/Price|Total price/);
  });

  it('turns an app path into an absolute link against the app URL', async () => {
    const out = await renderEmail(
      'payment-failed',
      { accountName: 'Quorrel Compression Co-op', billingUrl: '/billing', graceDays: 3 },
      appUrl,
    );
    expect(out.html).toContain(`href="${appUrl}/billing"`);
    expect(out.text).toContain(`${appUrl}/billing`);
  });

  it('escapes markup in props instead of rendering it', async () => {
    const out = await renderEmail(
      'invitation',
      { ...cases.invitation.props, inviterName: '<script>alert(1)</script>' },
      appUrl,
    );
    expect(out.html).not.toContain('<script>alert(1)</script>');
    expect(out.html).toContain('&lt;script&gt;');
  });

  it('keeps a chosen name from breaking the subject line or reordering text, and bounds its length', async () => {
    const out = await renderEmail(
      'invitation',
      { ...cases.invitation.props, accountName: 'Acme\r\nBcc: victim@example.com \u202eevil' },
      appUrl,
    );
    expect(out.subject).toBe('You are invited to Acme  Bcc: victim@example.com  evil on Dutywise');
    expect(out.html).not.toContain('\u202e');
    await expect(
      renderEmail('invitation', { ...cases.invitation.props, accountName: 'x'.repeat(161) }, appUrl),
    ).rejects.toThrow(/accountName must be at most 160 characters/);
  });

  it('refuses bad props with an error naming the field', async () => {
    await expect(
      renderEmail('payment-failed', { accountName: 'X', billingUrl: '/billing', graceDays: -1 }, appUrl),
    ).rejects.toThrow(EmailInputError);
    await expect(
      renderEmail('payment-failed', { accountName: 'X', billingUrl: '/billing', graceDays: -1 }, appUrl),
    ).rejects.toThrow(/props\.graceDays/);
    await expect(
      renderEmail('quote-sent', { ...cases['quote-sent'].props, quoteNumber: '  ' }, appUrl),
    ).rejects.toThrow(/props\.quoteNumber must not be empty/);
    await expect(renderEmail('no-such' as EmailTemplate, {}, appUrl)).rejects.toThrow(
      /unknown e-mail template "no-such"/,
    );
  });
});
