'use client';

import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { GAS_PRESETS } from '@/lib/thermo';
import type { DeskValues } from '../_lib/form-types';
import {
  FRACTION_SUM_TOLERANCE,
  SPECIES_OPTIONS,
  mixtureSum,
  normaliseRows,
  presetRows,
  type MixtureSum,
} from '../_lib/mixture';
import { inputIdOf } from '../_lib/steps';
import { ChoiceGroup } from './choice-group';
import { useDesk } from './desk-context';
import { inputClass } from './field-frame';

// Humid air has no fixed composition to start from.
const FIXED_PRESETS = GAS_PRESETS.filter((p) => p.moleFractions);
const button =
  'rounded-md border border-paper-line bg-paper-raised px-3 py-1.5 text-sm text-ink hover:bg-paper-sunk disabled:opacity-50';

/** "Sum 0.9990: must be 1 ± 0.0001", live, announced politely. */
function MixtureSumLine({ sum, tolerance }: { sum: MixtureSum; tolerance: number }) {
  const text = !sum.readable ? 'Sum: enter numbers in every row' : `Sum ${sum.sum.toFixed(4)}`;
  return (
    <p
      aria-live="polite"
      data-testid="mixture-sum"
      data-ok={sum.ok}
      className={`font-mono text-sm ${sum.ok ? 'text-tide-700' : 'text-severity-caution'}`}
    >
      {text}
      {sum.readable && !sum.ok && <span className="font-sans"> · must be 1 ± {tolerance}</span>}
      {sum.ok && <span className="font-sans"> · sums to 1</span>}
    </p>
  );
}

/** Components and fractions with a live sum, Normalise, and a start from any preset's composition. */
export function MixtureEditor() {
  const { control, register, setValue } = useFormContext<DeskValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'gas.components' });
  const [rows, basis] = useWatch({ control, name: ['gas.components', 'gas.basis'] });
  const { errors } = useDesk();
  const sum = mixtureSum(rows ?? []);
  const normalise = () => {
    const next = normaliseRows(rows ?? []);
    if (next) setValue('gas.components', next, { shouldDirty: true, shouldValidate: true });
  };
  const fromPreset = (id: string) => {
    const next = presetRows(id);
    if (next) setValue('gas.components', next, { shouldDirty: true });
  };
  const error = errors['gas.components'] ?? errors['gas.basis'];
  return (
    <div className="space-y-3" id={inputIdOf('gas.components')} tabIndex={-1}>
      <div className="flex flex-wrap items-end gap-4">
        <ChoiceGroup
          name="gas.basis"
          legend="Fractions are"
          choices={[
            { value: 'mole', label: 'Mole', testId: 'basis-mole' },
            { value: 'mass', label: 'Mass', testId: 'basis-mass' },
          ]}
        />
        <label className="text-label text-ink-soft">
          Start from
          <select
            className="ml-2 rounded-md border border-paper-line bg-paper-raised px-2 py-1.5 text-sm text-ink"
            value=""
            onChange={(e) => fromPreset(e.target.value)}
            data-testid="mixture-from-preset"
          >
            <option value="">a named gas…</option>
            {FIXED_PRESETS.map((p) => (
              <option key={p.id} value={p.id}>
                {p.displayName}
              </option>
            ))}
          </select>
        </label>
      </div>
      <table className="w-full text-sm">
        <caption className="sr-only">Mixture components</caption>
        <thead>
          <tr className="text-left text-label text-ink-soft">
            <th scope="col" className="pb-1 font-medium">
              Component
            </th>
            <th scope="col" className="pb-1 font-medium">
              {basis === 'mass' ? 'Mass' : 'Mole'} fraction
            </th>
            <th scope="col">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {fields.map((f, i) => (
            <tr key={f.id} data-testid={`mixture-row-${i}`}>
              <td className="py-1 pr-2">
                <select
                  aria-label={`Component ${i + 1}`}
                  className="w-full rounded-md border border-paper-line bg-paper-raised px-2 py-2 text-sm"
                  {...register(`gas.components.${i}.species`)}
                >
                  {SPECIES_OPTIONS.map((o) => (
                    <option key={o.value} value={o.value}>
                      {o.label}
                    </option>
                  ))}
                </select>
              </td>
              <td className="py-1 pr-2">
                <input
                  aria-label={`Fraction of component ${i + 1}`}
                  inputMode="decimal"
                  autoComplete="off"
                  data-testid={`mixture-fraction-${i}`}
                  className={inputClass(false)}
                  {...register(`gas.components.${i}.fraction`)}
                />
              </td>
              <td className="py-1 text-right">
                <button
                  type="button"
                  className={button}
                  onClick={() => remove(i)}
                  disabled={fields.length <= 1}
                  aria-label={`Remove component ${i + 1}`}
                >
                  Remove
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="flex flex-wrap items-center gap-3">
        <button
          type="button"
          className={button}
          onClick={() => append({ species: 'N2', fraction: '' })}
          disabled={fields.length >= 12}
          data-testid="mixture-add"
        >
          Add component
        </button>
        <button
          type="button"
          className={button}
          onClick={normalise}
          disabled={!sum.readable || !(sum.sum > 0) || sum.ok}
          data-testid="mixture-normalise"
        >
          Normalise to 1
        </button>
        <MixtureSumLine sum={sum} tolerance={FRACTION_SUM_TOLERANCE} />
      </div>
      {error && (
        <p data-testid="error-gas-components" className="text-hint font-medium text-severity-danger">
          {error}
        </p>
      )}
    </div>
  );
}
