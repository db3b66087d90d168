'use client';

import { useFormContext } from 'react-hook-form';
import { SelectField } from '@/app/_components/select-field';
import { accountOptionLabel } from '@/lib/accounts/label';
import { roundForField, switchUnitValue } from '../_lib/convert';
import type { DeskValues } from '../_lib/form-types';
import { sitePressureOf } from '../_lib/site-pressure';
import { DESK_STEPS } from '../_lib/steps';
import { useDesk } from './desk-context';
import { QuantityField } from './quantity-field';
import { ServiceChoice } from './service-choice';
import { FieldGrid, StepSection } from './step-section';

type Props = { accountChoice: 'pick' | 'fixed' | 'none'; fixedAccountName: string | null };

/** Step 1: what is being sized, for whom, and the site pressure gauge readings are taken against. */
export function ServiceStep({ accountChoice, fixedAccountName }: Props) {
  const { register, setValue, getValues } = useFormContext<DeskValues>();
  const desk = useDesk();
  const accountField = register('accountId', {
    onChange: (e: { target: { value: string } }) => {
      const site = sitePressureOf(desk.accounts.find((a) => a.id === e.target.value));
      const unit = getValues('site.barometricPressure.unit');
      const r = switchUnitValue('barometric', roundForField(site.kpa), 'kPa', unit, {
        barometricPressurePa: 101_325,
        flow: null,
      });
      setValue('site.barometricPressure.value', r.ok ? r.value : String(site.kpa), { shouldDirty: true });
    },
  });
  return (
    <StepSection
      step={DESK_STEPS[0]!}
      accent={desk.service === 'heater' ? 'copper' : 'tide'}
      description="What is sized, for which customer, and the site pressure gauge readings refer to."
    >
      <div className="space-y-4">
        <ServiceChoice />
        <FieldGrid>
          {accountChoice === 'pick' && (
            <SelectField
              label="Customer account"
              placeholder="Choose an account (needed to save)"
              options={desk.accounts.map((a) => ({ value: a.id, label: accountOptionLabel(a) }))}
              hint="Sets the site barometric pressure and where the sizing is saved."
              data-testid="field-accountId"
              {...accountField}
            />
          )}
          {accountChoice === 'fixed' && (
            <div>
              <p className="text-label text-ink-soft">Customer account</p>
              <p
                className="mt-1 rounded-md border border-paper-line bg-paper-sunk px-3 py-2 text-sm"
                data-testid="fixed-account"
              >
                {fixedAccountName}
              </p>
            </div>
          )}
          <QuantityField
            path="site.barometricPressure"
            label="Site barometric pressure"
            hint={`Gauge pressures are read against this; ${desk.barometricSource}.`}
          />
        </FieldGrid>
      </div>
    </StepSection>
  );
}
