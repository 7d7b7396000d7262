import { useId, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface ProgressBarProps {
  label: string;
  /** Whole percent, 0..100. */
  percent: number;
  /** The percentage in words beside the label, so the number is there without looking at the bar. */
  reading: ReactNode;
  /** What a screen reader says for the value, e.g. "40 % of full cure". */
  valueText: string;
  size?: 'regular' | 'large';
  /** Drawn over the bar, e.g. ticks at milestones. */
  overlay?: ReactNode;
  /** Shown under the bar, e.g. the names of the milestones. */
  footer?: ReactNode;
  readingClassName?: string;
}

/** A labelled bar with its percentage written out beside the label. */
export function ProgressBar({ label, percent, reading, valueText, size = 'regular', overlay, footer, readingClassName }: ProgressBarProps) {
  const labelId = useId();
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span id={labelId} className="font-semibold text-ink">
          {label}
        </span>
        <span className={cx('tabular-nums', readingClassName)}>{reading}</span>
      </div>
      <div
        role="progressbar"
        aria-labelledby={labelId}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={valueText}
        className={cx('relative w-full overflow-hidden rounded-full border border-line-strong bg-paper-deep', size === 'large' ? 'h-4' : 'h-3')}
      >
        <div className="h-full bg-resin-400 transition-[width]" style={{ width: `${percent}%` }} />
        {overlay}
      </div>
      {footer}
    </div>
  );
}
