'use client';

import { useId, type ReactNode } from 'react';
import { useFormContext, type Path } from 'react-hook-form';
import type { DeskValues } from '../_lib/form-types';

export type Choice = { value: string; label: ReactNode; testId?: string };

type Props = {
  name: Path<DeskValues>;
  legend: string;
  choices: readonly Choice[];
  hint?: ReactNode;
  error?: string;
  compact?: boolean;
};

/** A native radio group drawn as a segmented control: arrow keys move, Space selects. */
export function ChoiceGroup({ name, legend, choices, hint, error, compact }: Props) {
  const { register } = useFormContext<DeskValues>();
  const id = useId();
  return (
    <fieldset aria-describedby={hint ? `${id}-hint` : undefined}>
      <legend className="text-label text-ink-soft">{legend}</legend>
      <div className="mt-1 inline-flex flex-wrap rounded-md border border-paper-line bg-paper-sunk p-0.5">
        {choices.map((c) => (
          <label key={c.value} className="relative">
            <input
              type="radio"
              value={c.value}
              data-testid={c.testId}
              className="peer absolute inset-0 z-10 h-full w-full cursor-pointer appearance-none opacity-0"
              {...register(name)}
            />
            <span
              className={`block cursor-pointer rounded-[5px] text-sm text-ink-soft peer-checked:bg-paper-raised peer-checked:font-medium peer-checked:text-ink peer-checked:shadow-panel peer-focus-visible:outline-3 peer-focus-visible:outline-offset-1 peer-focus-visible:outline-tide-500 ${
                compact ? 'min-w-9 px-2.5 py-1.5 text-center font-mono' : 'px-3 py-1.5'
              }`}
            >
              {c.label}
            </span>
          </label>
        ))}
      </div>
      {hint && (
        <p id={`${id}-hint`} className="mt-1 text-hint text-ink-muted">
          {hint}
        </p>
      )}
      {error && <p className="mt-1 text-hint font-medium text-severity-danger">{error}</p>}
    </fieldset>
  );
}
