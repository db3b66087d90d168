import type { ReactNode } from 'react';

type Props = { title: string; eyebrow?: ReactNode; description?: ReactNode; actions?: ReactNode };

/** The heading block every desk page opens with: what this is, and the main thing to do here. */
export function PageHeader({ title, eyebrow, description, actions }: Props) {
  return (
    <header className="flex flex-wrap items-end justify-between gap-4 border-b border-paper-line pb-4">
      <div className="min-w-0">
        {eyebrow && <p className="text-label uppercase tracking-wide text-ink-muted">{eyebrow}</p>}
        <h1 className="mt-1 text-2xl font-semibold text-ink">{title}</h1>
        {description && <div className="mt-1 max-w-3xl text-sm text-ink-soft">{description}</div>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </header>
  );
}

/** The padded column a desk page sits in. */
export function PageBody({ children }: { children: ReactNode }) {
  return <main className="mx-auto w-full max-w-6xl space-y-6 px-4 py-6 md:px-8">{children}</main>;
}

/** A titled panel within a page. */
export function Section({
  title,
  id,
  actions,
  children,
}: {
  title: string;
  id: string;
  actions?: ReactNode;
  children: ReactNode;
}) {
  return (
    <section
      aria-labelledby={id}
      className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel"
    >
      <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
        <h2 id={id} className="text-lg font-semibold text-ink">
          {title}
        </h2>
        {actions}
      </div>
      {children}
    </section>
  );
}
