'use client';

import { ChoiceGroup } from './choice-group';
import { useDesk } from './desk-context';
import { PlainNumberField } from './plain-number-field';

/** Supply voltage and phases for line current (heater elements, or the compressor motor). */
export function SupplyFields({ forMotor }: { forMotor: boolean }) {
  const { errors } = useDesk();
  return (
    <>
      <PlainNumberField
        path="supply.voltageV"
        label="Supply voltage"
        suffix="V"
        hint={
          forMotor
            ? 'Motor supply, line to line; current uses typical motor efficiency and power factor.'
            : 'Line to line for three-phase; rate elements at the minimum voltage.'
        }
      />
      <ChoiceGroup
        name="supply.phases"
        legend="Phases"
        choices={[
          { value: '3', label: 'Three-phase', testId: 'phases-3' },
          { value: '1', label: 'Single-phase', testId: 'phases-1' },
        ]}
        error={errors['supply.phases']}
      />
    </>
  );
}
