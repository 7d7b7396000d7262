import type { PourSummary } from '@gelpoint/contracts';
import { DateTime } from '../../../components/ui/DateTime';
import { LinkedList } from '../../../components/ui/LinkedList';
import { paths } from '../../../config/paths';
import { pourStatusWords, stageReachedWords } from '../utils/cure-words';
import { CureStageIcon } from './CureStageIcon';

/** A piece's pours: each a link to its cure log, with where it stands. */
export function PiecePoursList({ pours }: { pours: readonly PourSummary[] }) {
  const rows = pours.map((pour) => ({
    id: pour.id,
    to: paths.pour.getHref(pour.id),
    name: pour.planName,
    detail: (
      <>
        Started <DateTime iso={pour.startedAt} /> · {pour.batchesLogged} of {pour.batchesPlanned} cups logged
      </>
    ),
    aside: (
      <span className="flex items-center gap-2 text-sm font-semibold">
        <CureStageIcon stage={pour.cure.stageReached} />
        {pourStatusWords[pour.status]}: {stageReachedWords(pour.cure.stageReached)}
      </span>
    ),
  }));
  return <LinkedList label="Pours of this piece" rows={rows} />;
}
