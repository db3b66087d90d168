'use client';

import { useState, type ReactNode } from 'react';
import { useController, useFormContext, type Path } from 'react-hook-form';
import { unitLabel } from '@/lib/units';
import { switchUnitValue } from '../_lib/convert';
import type { FieldKey } from '../_lib/field-paths';
import { QUANTITY_FIELDS, type DeskValues, type QuantityPath } from '../_lib/form-types';
import { inputIdOf } from '../_lib/steps';
import { quantityAt, switchContextOf } from '../_lib/switch-system';
import { UNIT_GROUPS } from '../_lib/unit-pickers';
import { useDesk } from './desk-context';
import { FieldFrame, describedBy, inputClass } from './field-frame';

type Props = {
  path: QuantityPath & FieldKey;
  label: string;
  hint?: ReactNode;
  placeholder?: string;
  className?: string;
};

/** A number with its unit picker; changing the unit converts the number so the physical value stays. */
export function QuantityField({ path, label, hint, placeholder, className }: Props) {
  const { register, getValues, setValue } = useFormContext<DeskValues>();
  const desk = useDesk();
  const kind = QUANTITY_FIELDS[path];
  const unit = useController<DeskValues>({ name: `${path}.unit` as Path<DeskValues> });
  const [unitNote, setUnitNote] = useState<string | null>(null);
  const id = inputIdOf(path);
  const testKey = path.replace(/\./g, '-');
  const error = desk.errors[path] ?? (unitNote ? `${label}: ${unitNote}` : undefined);

  const onUnit = (to: string) => {
    const values = getValues();
    const q = quantityAt(values, path);
    const r = switchUnitValue(kind, q.value, q.unit, to, switchContextOf(values), desk.exact.current[path]);
    if (!r.ok) {
      setUnitNote(r.reason);
      return;
    }
    setUnitNote(null);
    setValue(`${path}.value` as Path<DeskValues>, r.value, { shouldDirty: true, shouldValidate: true });
    unit.field.onChange(to);
    if (r.exact) desk.exact.current[path] = r.exact;
  };

  const valueField = register(`${path}.value` as Path<DeskValues>, { onChange: () => setUnitNote(null) });
  return (
    <FieldFrame inputId={id} label={label} hint={hint} error={error} testKey={testKey} className={className}>
      <div className="flex">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          placeholder={placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, hint, error)}
          data-testid={`field-${testKey}`}
          className={`${inputClass(error)} rounded-r-none`}
          {...valueField}
        />
        <select
          aria-label={`${label} unit`}
          data-testid={`field-${testKey}-unit`}
          value={String(unit.field.value)}
          onChange={(e) => onUnit(e.target.value)}
          onBlur={unit.field.onBlur}
          className="-ml-px w-28 shrink-0 rounded-r-md border border-paper-line bg-paper-sunk px-2 py-2 text-sm text-ink focus:border-tide-500"
        >
          {UNIT_GROUPS[kind].map((g) => (
            <optgroup key={g.label} label={g.label}>
              {g.units.map((u) => (
                <option key={u} value={u}>
                  {unitLabel(u)}
                </option>
              ))}
            </optgroup>
          ))}
        </select>
      </div>
    </FieldFrame>
  );
}
