/** A heating element: a resistance coil in a duct, with rising heat. Drawn for Dutywise. */
export function HeaterGlyph({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect x="3" y="11" width="26" height="12" rx="2" fill="none" stroke="currentColor" strokeWidth="1.6" />
      <path
        d="M6 17h3l1.5-3 2 6 2-6 2 6 2-6 2 6 1.5-3H26"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.6"
        strokeLinejoin="round"
      />
      <path
        d="M11 8c-1-1.5 1-2.5 0-4M16 8c-1-1.5 1-2.5 0-4M21 8c-1-1.5 1-2.5 0-4"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.3"
        strokeLinecap="round"
      />
    </svg>
  );
}

/** A compression stage: a casing narrowing from suction to discharge, with a shaft. Drawn for Dutywise. */
export function CompressorGlyph({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <path d="M7 6 25 11v10L7 26Z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
      <path d="M1 16h6M25 16h6" stroke="currentColor" strokeWidth="1.6" />
      <path d="M12 12v8M17 13.5v5M21 14.6v2.8" stroke="currentColor" strokeWidth="1.3" strokeLinecap="round" />
    </svg>
  );
}
