'use client';

import { useFormContext } from 'react-hook-form';
import type { DeskValues } from '../_lib/form-types';
import { CompressorGlyph, HeaterGlyph } from './service-icons';

const OPTIONS = [
  {
    value: 'heater',
    title: 'Heater',
    text: 'Electric process gas heater: kW to take a flow from inlet to outlet temperature',
    Glyph: HeaterGlyph,
    tone: 'peer-checked:border-copper-500 peer-checked:bg-copper-50 text-copper-700',
  },
  {
    value: 'compressor',
    title: 'Compressor',
    text: 'Shaft power, stages, discharge temperatures and the motor',
    Glyph: CompressorGlyph,
    tone: 'peer-checked:border-tide-500 peer-checked:bg-tide-50 text-tide-700',
  },
] as const;

/** Heater or compressor, as two large radio cards. */
export function ServiceChoice() {
  const { register } = useFormContext<DeskValues>();
  return (
    <fieldset>
      <legend className="text-label text-ink-soft">Service</legend>
      <div className="mt-1 grid gap-3 @md:grid-cols-2">
        {OPTIONS.map(({ value, title, text, Glyph, tone }) => (
          <label key={value} className="relative block cursor-pointer">
            <input
              type="radio"
              value={value}
              data-testid={`service-${value}`}
              className="peer absolute inset-0 z-10 h-full w-full cursor-pointer appearance-none opacity-0"
              {...register('service')}
            />
            <span
              className={`flex h-full gap-3 rounded-md border-2 border-paper-line bg-paper-raised p-3 peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-tide-500 ${tone}`}
            >
              <Glyph className="h-8 w-8 shrink-0" />
              <span>
                <span className="block font-semibold text-ink">{title}</span>
                <span className="block text-hint text-ink-muted">{text}</span>
              </span>
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
