import type { ReactNode } from 'react';

export type KeyItem = {
  label: ReactNode;
  stroke: string;
  dash?: string;
  marker?: 'circle' | 'square' | 'none';
  area?: boolean;
  bar?: boolean;
};

/** A printed legend: line samples with their dash and marker, so the key survives grey-scale print. */
export function ChartKey({ items }: { items: readonly KeyItem[] }) {
  return (
    <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-hint text-ink-soft">
      {items.map((it, i) => (
        <li key={i} className="inline-flex items-center gap-1.5">
          <svg viewBox="0 0 28 12" className="h-3 w-7" aria-hidden="true">
            {it.area && (
              <rect
                x="1"
                y="1"
                width="26"
                height="10"
                fill={it.stroke}
                fillOpacity="0.12"
                stroke={it.stroke}
                strokeDasharray="3 2"
              />
            )}
            {it.bar && <rect x="6" y="1" width="16" height="10" fill={it.stroke} />}
            {!it.area && !it.bar && (
              <line x1="1" y1="6" x2="27" y2="6" stroke={it.stroke} strokeWidth="2" strokeDasharray={it.dash} />
            )}
            {it.marker === 'circle' && (
              <circle cx="14" cy="6" r="3" fill="white" stroke={it.stroke} strokeWidth="1.6" />
            )}
            {it.marker === 'square' && <rect x="11" y="3" width="6" height="6" fill={it.stroke} />}
          </svg>
          {it.label}
        </li>
      ))}
    </ul>
  );
}
