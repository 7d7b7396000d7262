import { useId } from 'react';
import { cx } from '../../../lib/cx';
import type { Cure } from '../types';
import { progressPercent, stageMarkers } from '../utils/cure-progress';
import { stageAheadWords } from '../utils/cure-words';

export interface CureProgressBarProps {
  cure: Pick<Cure, 'progress' | 'stages' | 'equivalentHoursAtRef'>;
  label?: string;
  /** Ticks where each milestone falls, with their names below (the pour page); the board shows the bar alone. */
  showMarkers?: boolean;
}

/** How far the cure has come, as a bar and as a percentage in words, so the number never depends on the bar. */
export function CureProgressBar({ cure, label = 'Cure', showMarkers = false }: CureProgressBarProps) {
  const labelId = useId();
  const percent = progressPercent(cure.progress);
  const full = cure.stages.find((s) => s.key === 'full_cure')?.equivalentHoursAtRef;
  const markers = showMarkers ? stageMarkers(cure) : [];
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span id={labelId} className="font-semibold text-ink">
          {label}
        </span>
        <span className="tabular-nums text-ink">
          <strong className="text-lg">{percent} %</strong> of full cure
          {showMarkers && full !== undefined ? (
            <span className="text-ink-soft">
              {' '}
              · {cure.equivalentHoursAtRef.toFixed(1)} h of {full.toFixed(0)} h at the data sheet’s temperature
            </span>
          ) : null}
        </span>
      </div>
      <div
        role="progressbar"
        aria-labelledby={labelId}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${percent} % of full cure`}
        className="relative h-4 w-full overflow-hidden rounded-full border border-line-strong bg-paper-deep"
      >
        <div className="h-full bg-resin-400" style={{ width: `${percent}%` }} />
        {markers.map((marker) => (
          <span key={marker.key} aria-hidden="true" className="absolute top-0 h-full w-0.5 bg-walnut-800" style={{ left: `calc(${(marker.at * 100).toFixed(2)}% - 1px)` }} />
        ))}
      </div>
      {markers.length > 0 ? (
        <ol className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft" aria-label="Milestones on the bar">
          {markers.map((marker) => (
            <li key={marker.key} className={cx('flex items-center gap-1', marker.reached && 'font-semibold text-ink')}>
              <span aria-hidden="true">{marker.reached ? '●' : '○'}</span>
              {stageAheadWords(marker.key)} at {Math.round(marker.at * 100)} %
            </li>
          ))}
        </ol>
      ) : null}
    </div>
  );
}
