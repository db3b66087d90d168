'use client';

import { useFormContext, useWatch } from 'react-hook-form';
import { temperatureToK } from '@/lib/units';
import { pressureHint, riseHint, stageRatioHint } from '../_lib/field-hints';
import { barometricPaOf } from '../_lib/flow-context';
import type { DeskValues } from '../_lib/form-types';
import { DESK_STEPS } from '../_lib/steps';
import { ChoiceGroup } from './choice-group';
import { useDesk } from './desk-context';
import { PlainNumberField } from './plain-number-field';
import { QuantityField } from './quantity-field';
import { FieldGrid, StepSection } from './step-section';

const STAGE_CHOICES = [1, 2, 3, 4, 5, 6].map((n) => ({ value: String(n), label: String(n), testId: `stages-${n}` }));

/** Step 4: the outlet temperature of a heater, or a compressor's discharge pressure, staging and efficiency. */
export function TargetStep() {
  const { control, getValues } = useFormContext<DeskValues>();
  const desk = useDesk();
  useWatch({
    control,
    name: [
      'inlet',
      'outletTemperature',
      'dischargePressure',
      'stages',
      'interstagePressureDropPercent',
      'efficiencyKind',
      'site',
    ],
  });
  const v = getValues();
  const step = DESK_STEPS[3]!;
  if (desk.service === 'heater') {
    return (
      <StepSection step={step} accent="copper" description="The temperature the gas must leave at.">
        <FieldGrid>
          <QuantityField
            path="outletTemperature"
            label="Outlet temperature"
            hint={riseHint(v.inlet.temperature, v.outletTemperature, temperatureToK)}
          />
        </FieldGrid>
      </StepSection>
    );
  }
  const baro = barometricPaOf(v);
  const polytropic = v.efficiencyKind === 'polytropic';
  return (
    <StepSection
      step={step}
      accent="tide"
      description="Discharge pressure, number of stages, efficiency and intercooling."
    >
      <FieldGrid>
        <QuantityField
          path="dischargePressure"
          label="Discharge pressure"
          hint={pressureHint(v.dischargePressure, baro)}
        />
        <ChoiceGroup
          name="stages"
          legend="Stages"
          compact
          choices={STAGE_CHOICES}
          hint={stageRatioHint(v.inlet.pressure, v.dischargePressure, v.stages, v.interstagePressureDropPercent, baro)}
          error={desk.errors.stages}
        />
        <div className="space-y-2">
          <ChoiceGroup
            name="efficiencyKind"
            legend="Efficiency given as"
            choices={[
              { value: 'isentropic', label: 'Isentropic', testId: 'efficiency-isentropic' },
              { value: 'polytropic', label: 'Polytropic', testId: 'efficiency-polytropic' },
            ]}
          />
          <PlainNumberField
            path="efficiency"
            label={polytropic ? 'Polytropic efficiency per stage' : 'Isentropic efficiency per stage'}
            suffix="fraction"
            hint={
              polytropic
                ? 'e.g. 0.82; converted to isentropic at the stage ratio.'
                : 'e.g. 0.78; above 0 and at most 1.'
            }
          />
        </div>
        <QuantityField
          path="intercoolerOutletTemperature"
          label="Intercooler outlet temperature"
          placeholder="= suction"
          hint="Gas temperature after each intercooler; blank cools back to suction."
        />
        <PlainNumberField
          path="interstagePressureDropPercent"
          label="Interstage pressure drop"
          suffix="%"
          hint="Per intercooler, of absolute pressure; typically 1-2 %."
        />
      </FieldGrid>
    </StepSection>
  );
}
