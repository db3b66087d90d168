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

// Invented example for previews only: the demo scenario's vendor and customer (db/seed-scenario.ts), with
// numbers and figures in the formats the app itself writes.
export const quoteSentPreview: Props = {
  accountName: 'Tarnside Polymers',
  quoteNumber: 'Q26-0101',
  quoteTitle: 'Dryer air heating and conveying air',
  senderName: 'Ines Marlow',
  quoteUrl: 'http://localhost:3000/quotes',
  lines: [
    {
      title: 'Pellet dryer air heater',
      tag: 'EH-301',
      headline: '412 kW design duty',
      quantity: 1,
      price: 'USD 48,200.00',
    },
    { title: 'Conveying air compressor', tag: 'K-110', headline: '186 kW shaft power', quantity: 2, price: null },
  ],
  total: 'USD 48,200.00 for the 1 priced line (1 not priced)',
};
