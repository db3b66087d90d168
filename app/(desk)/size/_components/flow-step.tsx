'use client';

import { useFormContext, useWatch } from 'react-hook-form';
import { flowHint, pressureHint } from '../_lib/field-hints';
import { barometricPaOf, flowContextOf } from '../_lib/flow-context';
import type { DeskValues } from '../_lib/form-types';
import { DESK_STEPS } from '../_lib/steps';
import { useDesk } from './desk-context';
import { QuantityField } from './quantity-field';
import { FieldGrid, StepSection } from './step-section';

/** Step 3: how much gas, and its state where it enters. */
export function FlowStep() {
  const { control, getValues } = useFormContext<DeskValues>();
  const desk = useDesk();
  // Re-render on the fields the hints depend on; read the rest through getValues.
  useWatch({ control, name: ['flow', 'inlet', 'site', 'gas'] });
  const values = getValues();
  const compressor = desk.service === 'compressor';
  return (
    <StepSection
      step={DESK_STEPS[2]!}
      accent={compressor ? 'tide' : 'copper'}
      description="Mass, standard-volume or actual flow; inlet temperature and pressure."
    >
      <FieldGrid>
        <QuantityField path="flow" label="Flow" hint={flowHint(values.flow, flowContextOf(values))} />
        <QuantityField
          path="inlet.temperature"
          label={compressor ? 'Suction temperature' : 'Inlet temperature'}
          hint="Gas temperature entering; 200 to 6000 K property range."
        />
        <QuantityField
          path="inlet.pressure"
          label={compressor ? 'Suction pressure' : 'Inlet pressure'}
          hint={pressureHint(values.inlet.pressure, barometricPaOf(values))}
        />
      </FieldGrid>
    </StepSection>
  );
}
