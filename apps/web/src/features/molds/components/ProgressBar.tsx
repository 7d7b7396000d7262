import { useId } from 'react';

export interface ProgressBarProps {
  label: string;
  /** 0..1 */
  share: number;
  /** Said after the percentage, e.g. "of 12.4 MB sent". */
  detail?: string;
}

/** A labelled bar with its percentage written out, so the number is there without looking at the bar. */
export function ProgressBar({ label, share, detail }: ProgressBarProps) {
  const labelId = useId();
  const percent = Math.round(Math.min(1, Math.max(0, share)) * 100);
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span id={labelId} className="font-semibold text-ink">
          {label}
        </span>
        <span className="tabular-nums text-ink-soft">
          {percent} %{detail ? ` ${detail}` : ''}
        </span>
      </div>
      <div
        role="progressbar"
        aria-labelledby={labelId}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${percent} %`}
        className="h-3 w-full overflow-hidden rounded-full border border-line-strong bg-paper-deep"
      >
        <div className="h-full bg-resin-400 transition-[width]" style={{ width: `${percent}%` }} />
      </div>
    </div>
  );
}
