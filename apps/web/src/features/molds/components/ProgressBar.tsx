import { ProgressBar as Bar } from '../../../components/ui/ProgressBar';

export interface ProgressBarProps {
  label: string;
  /** 0..1 */
  share: number;
  /** Said after the percentage, e.g. "of 12.4 MB sent". */
  detail?: string;
}

/** A share of some work done, as a bar and as a whole percentage. */
export function ProgressBar({ label, share, detail }: ProgressBarProps) {
  const percent = Math.round(Math.min(1, Math.max(0, share)) * 100);
  return (
    <Bar label={label} percent={percent} reading={`${percent} %${detail ? ` ${detail}` : ''}`} readingClassName="text-ink-soft" valueText={`${percent} %`} />
  );
}
