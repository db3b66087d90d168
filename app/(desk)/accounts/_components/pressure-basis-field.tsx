'use client';

import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { TextField } from '@/app/_components/text-field';

export type PressureBasis = 'pressure' | 'altitude';

type Props = {
  basis: PressureBasis;
  onBasisChange: (b: PressureBasis) => void;
  pressure: UseFormRegisterReturn;
  altitude: UseFormRegisterReturn;
  pressureError?: string;
  altitudeError?: string;
  className?: string;
  /** The account's unit for barometric pressure. */
  pressureUnit?: 'kPa' | 'psia';
};

/** Site barometric pressure or site altitude: gauge pressures at this site are converted with one of them. */
export function PressureBasisField({
  basis,
  onBasisChange,
  pressure,
  altitude,
  pressureError,
  altitudeError,
  className = '',
  pressureUnit = 'kPa',
}: Props) {
  const name = useId();
  return (
    <fieldset className={`rounded-md border border-paper-line p-3 ${className}`}>
      <legend className="px-1 text-label text-ink-soft">Site atmosphere (for gauge pressures)</legend>
      <div className="flex flex-wrap gap-4 text-sm">
        {(['pressure', 'altitude'] as const).map((b) => (
          <label key={b} className="inline-flex items-center gap-2">
            <input
              type="radio"
              name={name}
              value={b}
              checked={basis === b}
              onChange={() => onBasisChange(b)}
              className="accent-tide-600"
            />
            {b === 'pressure' ? 'Barometric pressure' : 'Altitude'}
          </label>
        ))}
      </div>
      <div className="mt-3 max-w-xs">
        {basis === 'pressure' ? (
          <TextField
            label={
              pressureUnit === 'psia' ? 'Site barometric pressure (psia)' : 'Site barometric pressure (kPa, absolute)'
            }
            inputMode="decimal"
            hint={
              pressureUnit === 'psia'
                ? '7.25 to 15.95 psia; leave empty for 14.70 psia.'
                : '50 to 110 kPa; leave empty for 101.325 kPa.'
            }
            error={pressureError}
            {...pressure}
          />
        ) : (
          <TextField
            label="Site altitude (m above sea level)"
            inputMode="decimal"
            hint="-500 to 6000 m; pressure from the ISO 2533 standard atmosphere."
            error={altitudeError}
            {...altitude}
          />
        )}
      </div>
    </fieldset>
  );
}
