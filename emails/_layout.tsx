/** @jsxRuntime automatic */
/** @jsxImportSource react */
// The pragmas above: tsconfig keeps JSX for Next, so scripts run by tsx (the mail worker) need to be told the runtime.
import { Body, Button, Container, Head, Hr, Html, Preview, Section, Text } from '@react-email/components';
import type { CSSProperties, ReactNode } from 'react';

// Dutywise's mail look: graphite on warm paper, a copper rule under the wordmark, teal actions.
// Inline styles only: mail clients ignore stylesheets and most of CSS.
export const mailColours = {
  ink: '#1c232b',
  inkSoft: '#4a5561',
  paper: '#f6f4ef',
  sheet: '#fffdf9',
  line: '#e2ddd2',
  copper: '#b4562b',
  teal: '#16565d',
} as const;

const fontStack = "'IBM Plex Sans', 'Segoe UI', Helvetica, Arial, sans-serif";

const body: CSSProperties = {
  backgroundColor: mailColours.paper,
  color: mailColours.ink,
  fontFamily: fontStack,
  margin: 0,
  padding: '24px 0',
};
const sheet: CSSProperties = {
  backgroundColor: mailColours.sheet,
  border: `1px solid ${mailColours.line}`,
  borderRadius: 6,
  maxWidth: 560,
  padding: '0 28px 24px',
};
const wordmark: CSSProperties = {
  borderBottom: `3px solid ${mailColours.copper}`,
  color: mailColours.ink,
  fontSize: 18,
  fontWeight: 700,
  letterSpacing: '0.04em',
  margin: '0 0 20px',
  padding: '20px 0 10px',
};
const paragraph: CSSProperties = { color: mailColours.ink, fontSize: 15, lineHeight: '22px', margin: '0 0 14px' };
const small: CSSProperties = { color: mailColours.inkSoft, fontSize: 12, lineHeight: '18px', margin: '0 0 6px' };
const button: CSSProperties = {
  backgroundColor: mailColours.teal,
  borderRadius: 4,
  color: '#ffffff',
  display: 'inline-block',
  fontSize: 15,
  fontWeight: 600,
  padding: '11px 20px',
  textDecoration: 'none',
};
const notice: CSSProperties = {
  backgroundColor: mailColours.paper,
  borderLeft: `3px solid ${mailColours.copper}`,
  color: mailColours.ink,
  fontSize: 13,
  lineHeight: '19px',
  margin: '18px 0',
  padding: '10px 14px',
};

type LayoutProps = { preview: string; children: ReactNode; footerNote?: string };

/** The frame every Dutywise e-mail sits in: wordmark, body, a footer saying why the mail came. */
export function MailLayout({ preview, children, footerNote }: LayoutProps) {
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={body}>
        <Container style={sheet}>
          <Text style={wordmark}>DUTYWISE</Text>
          {children}
          <Hr style={{ borderColor: mailColours.line, margin: '24px 0 12px' }} />
          {footerNote && <Text style={small}>{footerNote}</Text>}
          <Text style={small}>Dutywise, the sizing desk for process gas heaters and compressors.</Text>
        </Container>
      </Body>
    </Html>
  );
}

export function Para({ children }: { children: ReactNode }) {
  return <Text style={paragraph}>{children}</Text>;
}

/** The one action a mail asks for; the URL is repeated in the plain-text part by the renderer. */
export function ActionButton({ href, children }: { href: string; children: ReactNode }) {
  return (
    <Section style={{ margin: '22px 0' }}>
      <Button href={href} style={button}>
        {children}
      </Button>
    </Section>
  );
}

/** Label and value rows for the facts a mail is about (numbers, tags, dates). */
export function FactList({ facts }: { facts: readonly { label: string; value: string }[] }) {
  return (
    <Section style={{ margin: '0 0 14px' }}>
      {facts.map((f) => (
        <Text key={f.label} style={{ ...paragraph, margin: '0 0 4px' }}>
          <span style={{ color: mailColours.inkSoft }}>{f.label}: </span>
          <strong>{f.value}</strong>
        </Text>
      ))}
    </Section>
  );
}

/** The statement every engineering mail carries: a Dutywise sizing is a starting point, not an approval. */
export const preliminaryStatement =
  'Sizings from Dutywise are preliminary. They must be checked and confirmed by a qualified engineer under the codes and standards that apply where the equipment will be installed before anything is ordered, built or operated.';

export function PreliminaryNotice() {
  return <Text style={notice}>{preliminaryStatement}</Text>;
}
