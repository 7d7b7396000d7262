import { useQuery } from '@tanstack/react-query';
import { moldListQueryOptions } from '../../../lib/resources/molds';

/** The piece's moulds, to pour into one of them instead of a quick shape: the moulds' own list entry, so a deletion reaches it. */
export const pieceMoldsQueryOptions = (pieceId: string) => moldListQueryOptions({ pieceId, limit: 200, offset: 0 });

export function usePieceMolds(pieceId: string) {
  return useQuery(pieceMoldsQueryOptions(pieceId));
}
