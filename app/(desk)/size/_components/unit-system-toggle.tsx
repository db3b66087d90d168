'use client';

import type { UnitSystem } from '@/lib/units';

type Props = { system: UnitSystem; onChange: (s: UnitSystem) => void; note: string | null };

const OPTIONS: { value: UnitSystem; label: string; hint: string }[] = [
  { value: 'si', label: 'SI', hint: 'kg/h, °C, bar g' },
  { value: 'us', label: 'US customary', hint: 'lb/h, °F, psig' },
];

/** SI or US customary for every field at once (each field's picker can still differ). */
export function UnitSystemToggle({ system, onChange, note }: Props) {
  return (
    <fieldset className="text-right">
      <legend className="sr-only">Unit system</legend>
      <div className="inline-flex rounded-md border border-paper-line bg-paper-sunk p-0.5">
        {OPTIONS.map((o) => (
          <label key={o.value} className="relative">
            <input
              type="radio"
              name="unit-system"
              value={o.value}
              checked={system === o.value}
              onChange={() => onChange(o.value)}
              data-testid={`unit-system-${o.value}`}
              className="peer absolute inset-0 z-10 h-full w-full cursor-pointer appearance-none opacity-0"
            />
            <span className="block cursor-pointer rounded-[5px] px-3 py-1.5 text-sm text-ink-soft peer-checked:bg-ink peer-checked:font-medium peer-checked:text-paper peer-focus-visible:outline-3 peer-focus-visible:outline-offset-1 peer-focus-visible:outline-tide-500">
              {o.label} <span className="hidden text-hint opacity-80 xl:inline">({o.hint})</span>
            </span>
          </label>
        ))}
      </div>
      <p className="mt-1 max-w-xs text-hint text-ink-muted empty:hidden" role="status" data-testid="unit-system-note">
        {note}
      </p>
    </fieldset>
  );
}
