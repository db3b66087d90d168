import type { Metadata } from 'next';
import Link from 'next/link';
import { IssueDatasheetButton } from '@/app/_components/datasheets/issue-datasheet-button';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { orNotFound, uuidOrNotFound } from '@/app/_components/route-guards';
import { ResultDetails } from '@/app/_components/sizing-result/result-details';
import { requirePageUser } from '@/lib/auth/guards';
import { can, isStaff } from '@/lib/auth/roles';
import { downloadAccess, listDatasheets } from '@/lib/datasheets/queries';
import { getSizing } from '@/lib/sizings/queries';
import { readStoredSizing } from '@/lib/sizings/stored-result';
import { auditLookup } from '@/lib/support/audit-lookup';
import { sizingEmails, sizingTrail } from '@/lib/support/sizing-record';
import { KeyValueTable } from './_components/key-value-table';
import { AuditTrail, EmailLog, RevisionList } from './_components/record-sections';
import { ResendButton } from './_components/resend-button';
import { SizingMeta } from './_components/sizing-meta';

/** Every saved sizing is a preliminary figure; this says so wherever one is shown in full. */
function PreliminaryNote() {
  return (
    <p
      role="note"
      className="rounded-md border border-severity-caution/40 bg-paper-raised px-3 py-2 text-sm text-severity-caution"
    >
      Preliminary sizing on the equation of state named below. Confirm the design with a qualified engineer under the
      local pressure-equipment and electrical codes before ordering or installing equipment.
    </p>
  );
}

export const metadata: Metadata = { title: 'Sizing' };

export default async function SizingPage({ params }: { params: Promise<{ sizingId: string }> }) {
  const { sizingId: raw } = await params;
  const user = await requirePageUser(`/sizings/${raw}`, 'sizing:read');
  const sizingId = uuidOrNotFound(raw);
  const sizing = await orNotFound(getSizing(user, sizingId));
  const [datasheetList, access, emails, trail] = await Promise.all([
    listDatasheets(user, { sizingId }),
    downloadAccess(user),
    sizingEmails(user, sizingId),
    sizingTrail(user, sizingId),
  ]);
  const datasheet = datasheetList[0];
  const stored = readStoredSizing(sizing.input, sizing.result);
  if (user.role === 'support')
    await auditLookup(user, 'sizing.viewed', 'sizing', sizingId, { number: sizing.number }, sizing.accountId);
  return (
    <PageBody>
      <PageHeader
        eyebrow={
          <Link href="/sizings" className="underline">
            Sizings
          </Link>
        }
        title={sizing.title}
        description={`Sizing ${sizing.number} for ${sizing.accountName}`}
      />
      <PreliminaryNote />
      <Section title="Summary" id="summary">
        <SizingMeta sizing={sizing} linkAccount={isStaff(user.role) || user.accountId === sizing.accountId} />
      </Section>
      <Section title="Work with it" id="actions">
        <div className="flex flex-wrap items-center gap-4 text-sm">
          <Link className="text-tide-700 underline" href={`/size?sizing=${sizing.id}`}>
            Open in the desk
          </Link>
          {can(user.role, 'sizing:save') && (
            <Link className="text-tide-700 underline" href={`/size?sizing=${sizing.id}&revise=1`}>
              Revise
            </Link>
          )}
          {can(user.role, 'sizing:save') && (
            <Link className="text-tide-700 underline" href={`/size?sizing=${sizing.id}&duplicate=1`}>
              Duplicate
            </Link>
          )}
        </div>
        {can(user.role, 'datasheet:issue') && (
          <div className="mt-3">
            <IssueDatasheetButton sizingId={sizing.id} latestRevision={datasheet?.revisions.at(-1)?.revision ?? null} />
          </div>
        )}
      </Section>
      <Section title="Datasheet revisions" id="datasheet">
        <RevisionList datasheet={datasheet} canDownload={access.unlocked} />
        {can(user.role, 'support:search') && datasheet && (
          <div className="mt-3">
            <ResendButton sizingId={sizing.id} />
          </div>
        )}
      </Section>
      {emails && (
        <Section title="E-mails sent" id="emails">
          <EmailLog emails={emails} />
        </Section>
      )}
      {trail && (
        <Section title="Audit trail" id="audit">
          <AuditTrail entries={trail} />
        </Section>
      )}
      {stored && (
        <section aria-labelledby="result-breakdown">
          <h2 id="result-breakdown" className="text-lg font-semibold text-ink">
            Result at save time
          </h2>
          <ResultDetails result={stored.result} input={stored.input} system={user.unitSystem} stale={false} />
        </section>
      )}
      <details className="group" open={!stored}>
        <summary className="cursor-pointer text-sm font-medium text-ink-soft">
          Every saved input and figure, as stored
        </summary>
        <div className="mt-3 grid gap-6 xl:grid-cols-2">
          <Section title="Saved input" id="input">
            <KeyValueTable caption="Saved input" data={sizing.input} testId="sizing-input" />
          </Section>
          <Section title="Stored result" id="result">
            <KeyValueTable caption="Result" data={sizing.result} testId="sizing-result" />
          </Section>
        </div>
      </details>
    </PageBody>
  );
}
