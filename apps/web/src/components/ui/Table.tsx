import type { HTMLAttributes, ReactNode, TdHTMLAttributes, ThHTMLAttributes } from 'react';
import { cx } from '../../lib/cx';

export interface TableProps {
  /** Names the table for screen readers and names the scroll area on narrow screens. */
  caption: string;
  /** Show the caption on screen too. */
  showCaption?: boolean;
  children: ReactNode;
}

/**
 * A table that scrolls sideways on a phone instead of squeezing; the scroll area is focusable so a keyboard can
 * scroll it.
 */
export function Table({ caption, showCaption = false, children }: TableProps) {
  return (
    <div role="region" aria-label={caption} tabIndex={0} className="relative overflow-x-auto rounded-xl border border-line bg-white">
      <table className="w-full min-w-[36rem] border-collapse text-left text-base">
        <caption className={showCaption ? 'px-4 pt-3 text-left font-semibold' : 'sr-only'}>{caption}</caption>
        {children}
      </table>
    </div>
  );
}

export function Thead({ children }: { children: ReactNode }) {
  return <thead className="border-b border-line bg-paper-deep text-sm text-ink-soft">{children}</thead>;
}

export function Th({ className, scope = 'col', ...rest }: ThHTMLAttributes<HTMLTableCellElement>) {
  return <th scope={scope} className={cx('px-4 py-3 font-semibold', className)} {...rest} />;
}

export function Tr({ className, ...rest }: HTMLAttributes<HTMLTableRowElement>) {
  return <tr className={cx('border-b border-line last:border-b-0', className)} {...rest} />;
}

export function Td({ className, ...rest }: TdHTMLAttributes<HTMLTableCellElement>) {
  return <td className={cx('px-4 py-3 align-middle', className)} {...rest} />;
}
