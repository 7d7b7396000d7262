import type { Piece } from '@gelpoint/contracts';
import { Link } from 'react-router';
import { DateTime } from '../../../components/ui/DateTime';
import { paths } from '../../../config/paths';
import { PieceStageBadge } from './PieceStageBadge';

export function PiecesList({ pieces }: { pieces: readonly Piece[] }) {
  return (
    <ul className="flex flex-col gap-3" aria-label="Pieces">
      {pieces.map((piece) => (
        <li key={piece.id}>
          <Link
            to={paths.piece.getHref(piece.id)}
            className="flex min-h-touch flex-col gap-2 rounded-xl border border-line bg-white p-4 hover:border-walnut-400 hover:bg-walnut-50 sm:flex-row sm:items-center sm:justify-between"
          >
            <span className="flex min-w-0 flex-col">
              <span className="truncate text-lg font-bold text-walnut-900 underline-offset-4">{piece.name}</span>
              <span className="text-ink-soft">
                {piece.wood ? piece.wood : 'Wood not noted'} · updated <DateTime iso={piece.updatedAt} dateOnly />
              </span>
            </span>
            <PieceStageBadge stage={piece.stage} />
          </Link>
        </li>
      ))}
    </ul>
  );
}
