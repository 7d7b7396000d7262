import type { HTMLAttributes, ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface CardProps extends Omit<HTMLAttributes<HTMLElement>, 'title'> {
  as?: 'section' | 'div' | 'article';
  title?: ReactNode;
  /** Heading level for the title, so the page outline stays in order. */
  titleLevel?: 2 | 3;
  actions?: ReactNode;
}

export function Card({ as: Tag = 'section', title, titleLevel = 2, actions, className, children, ...rest }: CardProps) {
  const Heading = titleLevel === 2 ? 'h2' : 'h3';
  return (
    <Tag className={cx('min-w-0 rounded-xl border border-line bg-white p-4 shadow-sm sm:p-6', className)} {...rest}>
      {title || actions ? (
        <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
          {title ? <Heading className="text-lg font-bold text-walnut-900">{title}</Heading> : null}
          {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
        </div>
      ) : null}
      {children}
    </Tag>
  );
}
