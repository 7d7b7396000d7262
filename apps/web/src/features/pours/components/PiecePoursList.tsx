import type { PourSummary } from '@gelpoint/contracts';
import { DateTime } from '../../../components/ui/DateTime';
import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';
import { pourStatusWords, stageReachedWords } from '../utils/cure-words';
import { CureStageIcon } from './CureStageIcon';

/** A piece's pours: each a link to its cure log, with where it stands. */
export function PiecePoursList({ pours }: { pours: readonly PourSummary[] }) {
  return (
    <ul className="flex flex-col divide-y divide-line" aria-label="Pours of this piece">
      {pours.map((pour) => (
        <li key={pour.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <span className="flex flex-col">
            <TextLink to={paths.pour.getHref(pour.id)}>{pour.planName}</TextLink>
            <span className="text-sm text-ink-soft">
              Started <DateTime iso={pour.startedAt} /> · {pour.batchesLogged} of {pour.batchesPlanned} cups logged
            </span>
          </span>
          <span className="flex items-center gap-2 text-sm font-semibold">
            <CureStageIcon stage={pour.cure.stageReached} />
            {pourStatusWords[pour.status]}: {stageReachedWords(pour.cure.stageReached)}
          </span>
        </li>
      ))}
    </ul>
  );
}
