import { DateTime } from '../../../components/ui/DateTime';
import type { Cure } from '../types';
import { stageAheadWords, stageReachedWords } from '../utils/cure-words';
import { CureStageIcon } from './CureStageIcon';
import { RelativeTime } from './RelativeTime';

/** Each milestone: when the logged history reached it, or when it is expected at the assumed temperature. */
export function CureStagesList({ cure }: { cure: Pick<Cure, 'stages'> }) {
  return (
    <ol className="flex flex-col gap-2" aria-label="Cure milestones">
      {cure.stages.map((stage) => (
        <li key={stage.key} className="flex flex-wrap items-center gap-x-3 gap-y-0.5 rounded-lg bg-paper px-3 py-2">
          <CureStageIcon stage={stage.key} className={stage.reached ? 'text-moss-700' : 'text-walnut-500'} />
          <span className="font-semibold">{stage.reached ? stageReachedWords(stage.key) : stageAheadWords(stage.key)}</span>
          <span className="text-ink-soft">
            {stage.reached ? (
              stage.reachedAt ? (
                <>
                  reached <DateTime iso={stage.reachedAt} />
                </>
              ) : (
                'reached'
              )
            ) : stage.predictedAt ? (
              <>
                expected <RelativeTime iso={stage.predictedAt} />
              </>
            ) : (
              'not expected at this temperature: warm the piece'
            )}
          </span>
        </li>
      ))}
    </ol>
  );
}
