'use client';

import { DEFAULT_HEATER_RATINGS_KW } from '@/lib/engine/ratings';
import { DESK_STEPS } from '../_lib/steps';
import { ChoiceGroup } from './choice-group';
import { useDesk } from './desk-context';
import { PlainNumberField } from './plain-number-field';
import { QuantityField } from './quantity-field';
import { FieldGrid, StepSection } from './step-section';
import { SupplyFields } from './supply-fields';

const DEFAULT_LIST = `${DEFAULT_HEATER_RATINGS_KW.slice(0, 6).join(', ')} … ${DEFAULT_HEATER_RATINGS_KW.at(-1)} kW`;

/** Step 5: allowances, supply and catalogue for a heater; limits, method and driver for a compressor. */
export function OptionsStep() {
  const desk = useDesk();
  const step = DESK_STEPS[4]!;
  if (desk.service === 'heater') {
    return (
      <StepSection
        step={step}
        accent="copper"
        description="Allowances on the absorbed duty, the supply and the catalogue to pick a rating from."
      >
        <FieldGrid>
          <PlainNumberField
            path="heatLossPercent"
            label="Heat loss"
            suffix="%"
            hint="Of the absorbed duty; typically 2-10 % (0 to 50 %)."
          />
          <PlainNumberField
            path="designMarginPercent"
            label="Design margin"
            suffix="%"
            hint="On absorbed duty plus loss; typically 10-25 % (0 to 100 %)."
          />
          <SupplyFields forMotor={false} />
          <PlainNumberField
            path="heaterRatingsKw"
            label="Catalogue ratings"
            suffix="kW"
            wide
            placeholder="Dutywise standard list"
            hint={`Comma-separated; blank uses the standard list (${DEFAULT_LIST}).`}
          />
        </FieldGrid>
      </StepSection>
    );
  }
  return (
    <StepSection
      step={step}
      accent="tide"
      description="Driver losses, the discharge temperature limit and which method heads the result."
    >
      <FieldGrid>
        <PlainNumberField
          path="mechanicalEfficiency"
          label="Mechanical efficiency"
          suffix="fraction"
          hint="Bearings, seals and gear; typically 0.95-0.99."
        />
        <QuantityField
          path="dischargeTemperatureLimit"
          label="Discharge temperature limit"
          placeholder="default"
          hint="Blank: 150 °C, or 135 °C for hydrogen-rich gas (API 618 practice)."
        />
        <ChoiceGroup
          name="method"
          legend="Method basis for the headline"
          choices={[
            { value: 'variable-cp', label: 'Variable cp', testId: 'method-variable-cp' },
            { value: 'constant-k', label: 'Constant k', testId: 'method-constant-k' },
          ]}
          hint="Both are always computed and compared; variable cp integrates the property data."
          error={desk.errors.method}
        />
        <SupplyFields forMotor />
      </FieldGrid>
    </StepSection>
  );
}
