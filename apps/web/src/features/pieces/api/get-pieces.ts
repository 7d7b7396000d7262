import { PieceList } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import type { PieceListQuery } from '../utils/piece-filters';
import { pieceKeys } from './keys';

export function getPieces(query: PieceListQuery, signal?: AbortSignal): Promise<PieceList> {
  return callRoute('listPieces', { query: { ...query } }, signal ? { signal } : {});
}

export const piecesQueryOptions = (query: PieceListQuery) =>
  queryOptions({
    queryKey: pieceKeys.list(query),
    queryFn: ({ signal }) => getPieces(query, signal),
    placeholderData: keepPreviousData,
  });

export function usePieces(query: PieceListQuery) {
  return useQuery(piecesQueryOptions(query));
}
