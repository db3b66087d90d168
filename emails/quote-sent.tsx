/** @jsxRuntime automatic */
/** @jsxImportSource react */
import { Section, Text } from '@react-email/components';
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, FactList, MailLayout, mailColours, Para, PreliminaryNotice } from './_layout';

type Props = EmailProps['quote-sent'];

const lineStyle = {
  borderTop: `1px solid ${mailColours.line}`,
  color: mailColours.ink,
  fontSize: 14,
  lineHeight: '20px',
  margin: 0,
  padding: '8px 0',
} as const;

/**
 * A sales engineer sends a quote: what is in it, its prices when it has them, and where to read it in full. A
 * billing contact with no Dutywise sign-in yet gets the invitation to join the account as the way in.
 */
export function QuoteSentEmail(props: Props) {
  const { accountName, quoteNumber, quoteTitle, senderName, quoteUrl, joinUrl, lines, total } = props;
  return (
    <MailLayout
      preview={`Quote ${quoteNumber} for ${accountName}: ${quoteTitle}`}
      footerNote={`Sent by ${senderName} to ${accountName}. Reply to this mail to reach them.`}
    >
      <Para>Hello,</Para>
      <Para>
        {senderName} has sent {accountName} quote <strong>{quoteNumber}</strong>, “{quoteTitle}”.
      </Para>
      <FactList
        facts={[
          { label: 'Quote', value: quoteNumber },
          { label: 'Title', value: quoteTitle },
          { label: 'Items', value: String(lines.length) },
          ...(total ? [{ label: 'Total price', value: total }] : []),
        ]}
      />
      {lines.length > 0 && (
        <Section style={{ margin: '0 0 14px' }}>
          {lines.map((l, i) => (
            <Text key={`${i}-${l.title}`} style={lineStyle}>
              <strong>
                {l.quantity} × {l.title}
              </strong>
              {l.tag ? ` (${l.tag})` : ''}
              <br />
              <span style={{ color: mailColours.inkSoft }}>{l.headline}</span>
              {l.price ? (
                <>
                  <br />
                  {`Price: ${l.price}`}
                </>
              ) : null}
            </Text>
          ))}
        </Section>
      )}
      {joinUrl ? (
        <>
          <Para>
            You have no Dutywise sign-in yet. Join {accountName} with the link below: set your name and a password, and
            the quote opens. The link works once.
          </Para>
          <ActionButton href={joinUrl}>Join {accountName} and open the quote</ActionButton>
        </>
      ) : (
        <ActionButton href={quoteUrl}>Open the quote</ActionButton>
      )}
      <PreliminaryNotice />
    </MailLayout>
  );
}

// Invented example for previews only.
export const quoteSentPreview: Props = {
  accountName: 'Harrowgate Fuel Terminal',
  quoteNumber: 'Q-2025-0042',
  quoteTitle: 'Fuel gas preheat and booster, train 2',
  senderName: 'Mina Okafor',
  quoteUrl: 'http://localhost:3000/quotes/preview',
  lines: [
    {
      title: 'Fuel gas preheater',
      tag: 'E-2204',
      headline: '412 kW duty, 1,850 kg/h, 15.0 °C to 60.0 °C',
      quantity: 1,
      price: 'USD 48,200.00',
    },
    { title: 'Fuel gas booster', tag: 'K-2210A/B', headline: '186 kW shaft power', quantity: 2, price: null },
  ],
  total: 'USD 48,200.00 for the 1 priced line (1 not priced)',
};
