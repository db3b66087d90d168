'use client';

import { useFormContext, useWatch } from 'react-hook-form';
import { GAS_PRESETS, findPreset } from '@/lib/thermo';
import type { DeskValues } from '../_lib/form-types';
import { DESK_STEPS, inputIdOf } from '../_lib/steps';
import { ChoiceGroup } from './choice-group';
import { useDesk } from './desk-context';
import { FieldFrame, describedBy } from './field-frame';
import { HumidityFields } from './humidity-fields';
import { MixtureEditor } from './mixture-editor';
import { EquationPicker } from './equation-picker';
import { StepSection } from './step-section';

/** Step 2: a named gas, humid air, or a mixture by mole or mass fractions. */
export function GasStep() {
  const { register, control } = useFormContext<DeskValues>();
  const desk = useDesk();
  const [mode, presetId] = useWatch({ control, name: ['gas.mode', 'gas.preset'] });
  const preset = findPreset(presetId);
  const id = inputIdOf('gas.preset');
  const error = desk.errors['gas.preset'];
  const hint = preset?.note ?? (preset?.moleFractions ? 'Pure component.' : undefined);
  return (
    <StepSection
      step={DESK_STEPS[1]!}
      accent={desk.service === 'heater' ? 'copper' : 'tide'}
      description="The composition, and the equation of state its properties come from."
    >
      <div className="space-y-4">
        <ChoiceGroup
          name="gas.mode"
          legend="Gas given as"
          choices={[
            { value: 'preset', label: 'Named gas', testId: 'gas-mode-preset' },
            { value: 'mixture', label: 'Mixture', testId: 'gas-mode-mixture' },
          ]}
        />
        {mode === 'preset' ? (
          <div className="grid gap-x-5 gap-y-4 @lg:grid-cols-2">
            <FieldFrame inputId={id} label="Gas" hint={hint} error={error} testKey="gas-preset">
              <select
                id={id}
                data-testid="field-gas-preset"
                aria-invalid={error ? true : undefined}
                aria-describedby={describedBy(id, hint, error)}
                className="block w-full rounded-md border border-paper-line bg-paper-raised px-3 py-2 text-sm text-ink shadow-sm focus:border-tide-500"
                {...register('gas.preset')}
              >
                {GAS_PRESETS.map((p) => (
                  <option key={p.id} value={p.id}>
                    {p.displayName}
                  </option>
                ))}
              </select>
            </FieldFrame>
            {presetId === 'humid-air' && <HumidityFields />}
          </div>
        ) : (
          <MixtureEditor />
        )}
        <EquationPicker />
      </div>
    </StepSection>
  );
}
