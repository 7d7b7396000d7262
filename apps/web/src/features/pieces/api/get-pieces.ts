import { PieceList } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PieceListQuery } from '../utils/piece-filters';
import { pieceKeys } from './keys';

export function getPieces(query: PieceListQuery, signal?: AbortSignal): Promise<PieceList> {
  return api.get('/pieces', PieceList, { query: { ...query }, ...(signal ? { signal } : {}) });
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
