/** @jsxRuntime automatic */
/** @jsxImportSource react */
import type { EmailProps } from '@/lib/email/catalogue';
import { ActionButton, FactList, MailLayout, Para, PreliminaryNotice } from './_layout';

type Props = EmailProps['datasheet-issued'];

/** A datasheet revision was issued: its number, revision and where to download it. */
export function DatasheetIssuedEmail({
  accountName,
  datasheetNumber,
  revision,
  sizingTitle,
  equipmentTag,
  datasheetUrl,
  copy,
  supersededBy,
}: Props) {
  const facts = [
    { label: 'Datasheet', value: datasheetNumber },
    { label: 'Revision', value: revision },
    { label: 'Sizing', value: sizingTitle },
    ...(equipmentTag ? [{ label: 'Equipment tag', value: equipmentTag }] : []),
  ];
  return (
    <MailLayout
      preview={`${copy ? 'Copy: ' : ''}Datasheet ${datasheetNumber} rev. ${revision} is ready`}
      footerNote={`Sent to ${accountName} because a datasheet was issued on its account.`}
    >
      <Para>Hello,</Para>
      {copy && (
        <Para>
          This is a copy, sent again at your request, of the notice for revision {revision}.
          {supersededBy
            ? ` Revision ${revision} has since been superseded by revision ${supersededBy}; use ${supersededBy} for new work.`
            : ''}
        </Para>
      )}
      <Para>
        Datasheet <strong>{datasheetNumber}</strong> revision <strong>{revision}</strong> has been issued for{' '}
        {accountName}. An issued revision never changes; any later change comes out as a new revision.
      </Para>
      <FactList facts={facts} />
      <ActionButton href={datasheetUrl}>Open the datasheet</ActionButton>
      <PreliminaryNotice />
    </MailLayout>
  );
}

// Invented example for previews only: the demo scenario's vendor and customer (db/seed-scenario.ts), with
// numbers and figures in the formats the app itself writes.
export const datasheetIssuedPreview: Props = {
  accountName: 'Tarnside Polymers',
  datasheetNumber: 'DS26-0501',
  revision: 'B',
  sizingTitle: 'Pellet dryer air heater',
  equipmentTag: 'EH-301',
  datasheetUrl: 'http://localhost:3000/datasheets',
};
