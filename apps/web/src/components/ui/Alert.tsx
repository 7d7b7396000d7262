import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type AlertTone = 'info' | 'success' | 'warning' | 'error';

const toneClasses: Record<AlertTone, string> = {
  info: 'border-walnut-300 bg-walnut-50 text-walnut-900',
  success: 'border-moss-600 bg-moss-50 text-moss-700',
  warning: 'border-resin-500 bg-resin-50 text-resin-700',
  error: 'border-ember-600 bg-ember-50 text-ember-700',
};

// Each tone has its own shape, so the meaning survives without colour.
const toneGlyphs: Record<AlertTone, ReactNode> = {
  info: <path d="M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm-.9 4h1.8v1.8H9.1V6Zm0 3.2h1.8V14H9.1V9.2Z" />,
  success: <path d="M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm-1.2 11.4L5.2 9.8l1.3-1.3 2.3 2.3 4.7-4.7 1.3 1.3-6 6Z" />,
  warning: <path d="M10 1.8 19 17.5H1L10 1.8Zm-.9 5.4v5h1.8v-5H9.1Zm0 6.3v1.8h1.8v-1.8H9.1Z" />,
  error: <path d="M6.6 2h6.8L18 6.6v6.8L13.4 18H6.6L2 13.4V6.6L6.6 2Zm2.5 3.5v6h1.8v-6H9.1Zm0 7.3v1.8h1.8v-1.8H9.1Z" />,
};

export interface AlertProps {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  actions?: ReactNode;
  className?: string;
  /**
   * "alert" interrupts (form-level errors), "status" waits its turn (saved, sent), "none" for text that is on the
   * page from the start and needs no announcement.
   */
  live?: 'alert' | 'status' | 'none';
}

export function Alert({ tone = 'info', title, children, actions, className, live }: AlertProps) {
  const politeness = live ?? (tone === 'error' ? 'alert' : 'status');
  const role = politeness === 'none' ? undefined : politeness;
  return (
    <div role={role} className={cx('flex gap-3 rounded-lg border-l-4 border px-4 py-3', toneClasses[tone], className)}>
      <svg aria-hidden="true" viewBox="0 0 20 20" className="mt-0.5 size-5 shrink-0 fill-current">
        {toneGlyphs[tone]}
      </svg>
      <div className="flex min-w-0 flex-1 flex-col gap-1">
        {title ? <p className="font-bold">{title}</p> : null}
        {children ? <div className="text-base leading-relaxed">{children}</div> : null}
        {actions ? <div className="mt-2 flex flex-wrap gap-2">{actions}</div> : null}
      </div>
    </div>
  );
}
