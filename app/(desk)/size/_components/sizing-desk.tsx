'use client';

import { useDeferredValue, useEffect, useMemo, useRef, useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { ResultDetails } from '@/app/_components/sizing-result/result-details';
import type { UnitSystem } from '@/lib/units';
import type { AccountSite, QuoteOption, ReopenedSizing } from '../_lib/account-types';
import { defaultValues } from '../_lib/defaults';
import { groupIssues } from '../_lib/field-paths';
import { barometricPaOf } from '../_lib/flow-context';
import type { DeskValues } from '../_lib/form-types';
import { deskResolver } from '../_lib/resolver';
import { sharePath } from '../_lib/share-link';
import { sitePressureOf } from '../_lib/site-pressure';
import type { ExactValues } from '../_lib/switch-system';
import { validateDesk } from '../_lib/validate';
import { DeskProvider } from './desk-context';
import { DeskForm } from './desk-form';
import { DeskHeader } from './desk-header';
import { ResultPanel } from './result-panel';
import { ResultSummaryBar } from './result-summary-bar';
import { SavePanel } from './save-panel';
import { ShareActions } from './share-actions';
import { SignInInvite } from './sign-in-invite';
import { UnitSystemToggle } from './unit-system-toggle';
import { useInputsInUrl } from './use-inputs-in-url';
import { useLiveResult } from './use-live-result';
import { useUnitSystem } from './use-unit-system';

/** Where the site barometric pressure on the form comes from, in words. */
function useBarometricSource(values: DeskValues, accounts: readonly AccountSite[]): string {
  const account = accounts.find((a) => a.id === values.accountId);
  const expected = sitePressureOf(account);
  const edited = Math.abs(barometricPaOf(values) / 1000 - expected.kpa) > 0.0005;
  if (edited) return 'entered for this sizing';
  return account ? `${account.name}: ${expected.source}` : expected.source;
}

export type Viewer = {
  signedIn: boolean;
  roleLabel: string | null;
  canSave: boolean;
  canQuote: boolean;
  customerAccountId: string | null;
};

type Props = {
  initialValues: DeskValues;
  system: UnitSystem;
  viewer: Viewer;
  accounts: AccountSite[];
  quotes: QuoteOption[];
  reopened: ReopenedSizing | null;
  notices: string[];
};

/** The sizing desk: the guided form on the left, the live result beside it, the breakdown below. */
export function SizingDesk({
  initialValues,
  system: initialSystem,
  viewer,
  accounts,
  quotes,
  reopened,
  notices,
}: Props) {
  const form = useForm<DeskValues>({ defaultValues: initialValues, resolver: deskResolver, mode: 'onChange' });
  const exact = useRef<ExactValues>({});
  // Browser tests wait for this before typing, so no keystroke lands before React is listening.
  const [hydrated, setHydrated] = useState(false);
  useEffect(() => {
    setHydrated(true);
  }, []);
  const values = form.watch();
  const snapshot = JSON.stringify(values);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the serialised values, not the object identity
  const validation = useMemo(() => validateDesk(values), [snapshot]);
  const live = useLiveResult(validation.ok ? validation.key : null);
  useInputsInUrl(validation.ok ? validation.input : null, validation.ok ? validation.key : null);
  const units = useUnitSystem(initialSystem, viewer.signedIn, form, exact);
  const barometricSource = useBarometricSource(values, accounts);
  const server = live.failure?.kind === 'input' ? groupIssues(live.failure.issues, values.service) : null;
  const errors = validation.ok ? (server?.fields ?? {}) : validation.issues.fields;
  const issues = validation.ok ? server : validation.issues;
  const fresh = live.state === 'ready';
  // The breakdown and its charts follow the headline in a render of their own, which React may interrupt for the
  // next keystroke: a new result or a unit switch shows its figures first, then redraws the charts.
  const details = {
    result: useDeferredValue(live.result),
    input: useDeferredValue(live.input),
    system: useDeferredValue(units.system),
  };
  const accent = values.service === 'heater' ? 'copper' : 'tide';
  const startOver = () => {
    const fresh = defaultValues(units.system);
    form.reset({ ...fresh, accountId: values.accountId, site: values.site });
    exact.current = {};
  };
  return (
    <FormProvider {...form}>
      <DeskProvider
        value={{
          system: units.system,
          service: values.service,
          errors,
          exact,
          accounts,
          barometricSource,
          equationUsed: live.result
            ? { id: live.result.basis.equationOfState, reason: live.result.basis.equationOfStateReason }
            : null,
        }}
      >
        <main
          data-testid="sizing-desk"
          data-hydrated={hydrated}
          className="mx-auto w-full max-w-[96rem] px-4 pt-5 pb-16 md:px-6 lg:pb-5 xl:px-8"
        >
          <DeskHeader
            toggle={<UnitSystemToggle system={units.system} onChange={units.change} note={units.note} />}
            onNew={startOver}
            notices={notices}
          />
          <div className="mt-4 grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_20rem] xl:grid-cols-[minmax(0,1fr)_28rem]">
            <DeskForm
              errors={errors}
              ready={validation.ok}
              input={validation.ok ? validation.input : null}
              issues={validation.ok ? null : validation.issues}
              accent={accent}
              accountChoice={viewer.canSave ? (viewer.customerAccountId ? 'fixed' : 'pick') : 'none'}
              fixedAccountName={accounts.find((a) => a.id === viewer.customerAccountId)?.name ?? null}
            />
            <aside
              aria-label="Result and actions"
              className="space-y-4 lg:sticky lg:top-3 lg:max-h-[calc(100vh-1.5rem)] lg:overflow-y-auto lg:pb-2 print:static print:max-h-none"
            >
              <ResultPanel live={live} issues={issues} system={units.system} />
              {viewer.canSave ? (
                <SavePanel
                  input={fresh ? live.input : null}
                  accountId={values.accountId}
                  accounts={accounts}
                  quotes={quotes}
                  canQuote={viewer.canQuote}
                  reopened={reopened}
                />
              ) : viewer.signedIn ? (
                <p
                  className="rounded-panel border border-paper-line bg-paper-raised p-panel text-sm text-ink-soft"
                  data-testid="save-not-allowed"
                >
                  Your role ({viewer.roleLabel}) can size and look up sizings; saving is for sales engineers and
                  customers.
                </p>
              ) : (
                <SignInInvite nextPath={validation.ok ? `${sharePath(validation.input)}&from=desk` : '/size'} />
              )}
              <ShareActions
                input={validation.ok ? validation.input : null}
                result={fresh ? live.result : null}
                system={units.system}
              />
            </aside>
          </div>
          {details.result && details.input && (live.state === 'ready' || live.state === 'recomputing') && (
            <ResultDetails
              result={details.result}
              input={details.input}
              system={details.system}
              stale={live.state === 'recomputing' || details.result !== live.result}
            />
          )}
          <ResultSummaryBar live={live} />
        </main>
      </DeskProvider>
    </FormProvider>
  );
}
