import type { ReactNode } from 'react';

export interface EmptyStateProps {
  title: ReactNode;
  children?: ReactNode;
  actions?: ReactNode;
  headingLevel?: 2 | 3;
}

export function EmptyState({ title, children, actions, headingLevel = 2 }: EmptyStateProps) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <div className="flex flex-col items-center gap-3 rounded-xl border-2 border-dashed border-walnut-200 bg-paper px-6 py-10 text-center">
      <svg aria-hidden="true" viewBox="0 0 48 48" className="size-12 text-walnut-300">
        <rect x="6" y="14" width="36" height="24" rx="4" fill="none" stroke="currentColor" strokeWidth="2.5" />
        <path d="M6 28h36" stroke="currentColor" strokeWidth="2.5" strokeDasharray="4 3" />
      </svg>
      <Heading className="text-lg font-bold text-walnut-900">{title}</Heading>
      {children ? <div className="max-w-prose text-ink-soft">{children}</div> : null}
      {actions ? <div className="mt-1 flex flex-wrap justify-center gap-2">{actions}</div> : null}
    </div>
  );
}
