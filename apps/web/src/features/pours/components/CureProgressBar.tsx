import { ProgressBar } from '../../../components/ui/ProgressBar';
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
  const percent = progressPercent(cure.progress);
  const full = cure.stages.find((s) => s.key === 'full_cure')?.equivalentHoursAtRef;
  const markers = showMarkers ? stageMarkers(cure) : [];
  return (
    <ProgressBar
      label={label}
      percent={percent}
      size="large"
      readingClassName="text-ink"
      reading={
        <>
          <strong className="text-lg">{percent} %</strong> of full cure
          {showMarkers && full !== undefined ? (
            <span className="text-ink-soft">
              {' '}
              · {cure.equivalentHoursAtRef.toFixed(1)} h of {full.toFixed(0)} h at the data sheet’s temperature
            </span>
          ) : null}
        </>
      }
      valueText={`${percent} % of full cure`}
      overlay={markers.map((marker) => (
        <span
          key={marker.key}
          aria-hidden="true"
          className="absolute top-0 h-full w-0.5 bg-walnut-800"
          style={{ left: `calc(${(marker.at * 100).toFixed(2)}% - 1px)` }}
        />
      ))}
      footer={
        markers.length > 0 ? (
          <ol className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft" aria-label="Milestones on the bar">
            {markers.map((marker) => (
              <li key={marker.key} className={cx('flex items-center gap-1', marker.reached && 'font-semibold text-ink')}>
                <span aria-hidden="true">{marker.reached ? '●' : '○'}</span>
                {stageAheadWords(marker.key)} at {Math.round(marker.at * 100)} %
              </li>
            ))}
          </ol>
        ) : null
      }
    />
  );
}
