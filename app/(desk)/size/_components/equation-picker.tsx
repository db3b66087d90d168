'use client';

import { useFormContext, useWatch } from 'react-hook-form';
import type { DeskValues } from '../_lib/form-types';
import { ChoiceGroup } from './choice-group';
import { useDesk } from './desk-context';

const NAMES: Record<string, string> = {
  'gerg-2008': 'GERG-2008',
  'peng-robinson': 'Peng-Robinson',
  'ideal-gas': 'ideal gas',
};

const ABOUT: Record<DeskValues['equationOfState'], string> = {
  auto: 'GERG-2008 when it covers every component of the gas, Peng-Robinson otherwise (e.g. with ammonia).',
  'gerg-2008':
    'The multi-fluid reference equation for natural gases and their components (ISO 20765-2); 21 components.',
  'peng-robinson': 'The cubic equation, for any component; less exact near the critical point and for hydrogen.',
  'ideal-gas': 'Z = 1: right only at low pressure, far from condensation. Shown beside every real-gas result.',
};

/** Which equation of state the figures come from; the automatic choice says what it picked and why. */
export function EquationPicker() {
  const { control } = useFormContext<DeskValues>();
  const desk = useDesk();
  const chosen = useWatch({ control, name: 'equationOfState' });
  const used = desk.equationUsed;
  const now = chosen === 'auto' && used ? ` Now: ${NAMES[used.id] ?? used.id} (${used.reason}).` : '';
  return (
    <div data-testid="equation-picker">
      <ChoiceGroup
        name="equationOfState"
        legend="Equation of state"
        choices={[
          { value: 'auto', label: 'Automatic', testId: 'eos-auto' },
          { value: 'gerg-2008', label: 'GERG-2008', testId: 'eos-gerg-2008' },
          { value: 'peng-robinson', label: 'Peng-Robinson', testId: 'eos-peng-robinson' },
          { value: 'ideal-gas', label: 'Ideal gas', testId: 'eos-ideal-gas' },
        ]}
        hint={`${ABOUT[chosen]}${now}`}
        error={desk.errors.equationOfState}
      />
    </div>
  );
}
