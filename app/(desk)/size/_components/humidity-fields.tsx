'use client';

import { useFormContext, useWatch } from 'react-hook-form';
import type { DeskValues } from '../_lib/form-types';
import { ChoiceGroup } from './choice-group';
import { PlainNumberField } from './plain-number-field';
import { QuantityField } from './quantity-field';

/** Water content of humid air at the inlet: relative humidity or dew point. */
export function HumidityFields() {
  const { control } = useFormContext<DeskValues>();
  const by = useWatch({ control, name: 'gas.humidityBy' });
  return (
    <div className="space-y-3">
      <ChoiceGroup
        name="gas.humidityBy"
        legend="Humidity given as"
        choices={[
          { value: 'rh', label: 'Relative humidity', testId: 'humidity-rh' },
          { value: 'dew', label: 'Dew point', testId: 'humidity-dew' },
        ]}
      />
      {by === 'rh' ? (
        <PlainNumberField
          path="gas.relativeHumidityPercent"
          label="Relative humidity"
          suffix="%"
          hint="At the inlet temperature and pressure; 0 to 100 %."
        />
      ) : (
        <QuantityField
          path="gas.dewPoint"
          label="Dew point"
          hint="At the inlet pressure; must not exceed the inlet temperature."
        />
      )}
    </div>
  );
}
