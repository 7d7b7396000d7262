import type { Piece } from '@gelpoint/contracts';
import { DateTime } from '../../../components/ui/DateTime';
import { stageWords } from '../utils/stage-words';
import { PieceStageBadge } from './PieceStageBadge';

/** The read-only view, for roles that look but do not change. */
export function PieceDetails({ piece }: { piece: Piece }) {
  return (
    <dl className="grid gap-x-6 gap-y-4 sm:grid-cols-[10rem_minmax(0,1fr)]">
      <dt className="font-semibold text-ink-soft">Stage</dt>
      <dd className="flex flex-col items-start gap-1">
        <PieceStageBadge stage={piece.stage} />
        <span className="text-ink-soft">{stageWords[piece.stage].meaning}</span>
      </dd>
      <dt className="font-semibold text-ink-soft">Wood</dt>
      <dd>{piece.wood || 'Not noted'}</dd>
      <dt className="font-semibold text-ink-soft">Notes</dt>
      <dd className="whitespace-pre-line">{piece.notes || 'No notes yet'}</dd>
      <dt className="font-semibold text-ink-soft">Started by</dt>
      <dd>{piece.createdBy?.name ?? 'A former member'}</dd>
      <dt className="font-semibold text-ink-soft">Created</dt>
      <dd>
        <DateTime iso={piece.createdAt} />
      </dd>
      <dt className="font-semibold text-ink-soft">Last changed</dt>
      <dd>
        <DateTime iso={piece.updatedAt} />
      </dd>
    </dl>
  );
}
