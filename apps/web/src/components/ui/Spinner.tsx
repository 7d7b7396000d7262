import { cx } from '../../lib/cx';

export interface SpinnerProps {
  size?: 'sm' | 'md' | 'lg';
  /** Read out to screen readers; null when the surrounding text already says it. */
  label?: string | null;
  className?: string;
}

const sizeClasses = { sm: 'size-4 border-2', md: 'size-6 border-[3px]', lg: 'size-10 border-4' } as const;

export function Spinner({ size = 'md', label = 'Loading…', className }: SpinnerProps) {
  const ring = (
    <span aria-hidden="true" className={cx('inline-block animate-spin rounded-full border-current border-r-transparent', sizeClasses[size], className)} />
  );
  if (label === null) return ring;
  return (
    <span role="status" className="inline-flex items-center gap-2 text-ink-soft">
      {ring}
      <span className="sr-only">{label}</span>
    </span>
  );
}
