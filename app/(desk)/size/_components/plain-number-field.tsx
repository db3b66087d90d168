'use client';

import type { ReactNode } from 'react';
import { useFormContext, type Path } from 'react-hook-form';
import type { FieldKey } from '../_lib/field-paths';
import type { DeskValues } from '../_lib/form-types';
import { inputIdOf } from '../_lib/steps';
import { useDesk } from './desk-context';
import { FieldFrame, describedBy, inputClass } from './field-frame';

type Props = {
  path: FieldKey;
  label: string;
  suffix?: string;
  hint?: ReactNode;
  placeholder?: string;
  className?: string;
  wide?: boolean;
};

/** A number in a fixed unit (%, V, a fraction), the unit shown beside it. */
export function PlainNumberField({ path, label, suffix, hint, placeholder, className, wide }: Props) {
  const { register } = useFormContext<DeskValues>();
  const { errors } = useDesk();
  const id = inputIdOf(path);
  const testKey = path.replace(/\./g, '-');
  const error = errors[path];
  return (
    <FieldFrame inputId={id} label={label} hint={hint} error={error} testKey={testKey} className={className}>
      <div className="flex">
        <input
          id={id}
          type="text"
          inputMode={wide ? 'text' : 'decimal'}
          autoComplete="off"
          spellCheck={false}
          placeholder={placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, hint, error)}
          data-testid={`field-${testKey}`}
          className={`${inputClass(error)} ${suffix ? 'rounded-r-none' : ''}`}
          {...register(path as Path<DeskValues>)}
        />
        {suffix && (
          <span
            aria-hidden="true"
            className="-ml-px inline-flex w-16 shrink-0 items-center justify-center rounded-r-md border border-paper-line bg-paper-sunk px-2 text-sm text-ink-soft"
          >
            {suffix}
          </span>
        )}
      </div>
    </FieldFrame>
  );
}
