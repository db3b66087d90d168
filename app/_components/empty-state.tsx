import type { ReactNode } from 'react';

/** What a list shows when it has nothing in it: say so plainly and offer the next step. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div
      className="rounded-panel border border-dashed border-paper-line bg-paper-sunk/50 px-4 py-6 text-center"
      data-testid="empty-state"
    >
      <p className="font-medium text-ink-soft">{title}</p>
      {children && <div className="mt-1 text-sm text-ink-muted">{children}</div>}
    </div>
  );
}
