import type { ReactNode } from 'react';

export interface PageHeaderProps {
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  /** A short line above the title, such as the area the page belongs to. */
  eyebrow?: ReactNode;
}

/** The one <h1> of a page. */
export function PageHeader({ title, description, actions, eyebrow }: PageHeaderProps) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-line pb-4">
      <div className="flex min-w-0 flex-col gap-1">
        {eyebrow ? <p className="text-sm font-semibold tracking-wide text-resin-600 uppercase">{eyebrow}</p> : null}
        <h1 className="text-3xl font-bold text-walnut-900">{title}</h1>
        {description ? <div className="max-w-prose text-lg text-ink-soft">{description}</div> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}
