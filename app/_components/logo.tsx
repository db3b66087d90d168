/** Dutywise mark: a flame-shaped notch in a pressure gauge ring, drawn for this product. */
export function Logo({ className = 'h-7 w-7' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <circle cx="16" cy="16" r="13" fill="none" stroke="currentColor" strokeWidth="3" className="text-tide-600" />
      <path
        d="M16 7c3 4 5 6.5 5 10a5 5 0 0 1-10 0c0-2 1-3.5 2.2-4.6.2 1.7 1 2.6 2 2.9C15 12.8 15 10 16 7Z"
        className="fill-copper-500"
      />
    </svg>
  );
}
