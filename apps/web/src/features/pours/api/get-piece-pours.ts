import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import type { PourPage } from '../types';
import { boardRefreshMs } from './get-pours';
import { pourKeys } from './keys';

/** Every pour of one piece, whatever its state (at most 200: more than any piece is poured in). */
export function getPiecePours(pieceId: string, signal?: AbortSignal): Promise<PourPage> {
  return callRoute('listPours', { query: { pieceId, status: 'all', limit: 200 } }, signal ? { signal } : {});
}

export const piecePoursQueryOptions = (pieceId: string) =>
  queryOptions({
    // Under the lists, so a change to any pour reaches it with the board.
    queryKey: [...pourKeys.lists(), 'piece', pieceId] as const,
    queryFn: ({ signal }) => getPiecePours(pieceId, signal),
    refetchInterval: boardRefreshMs,
  });

export function usePiecePours(pieceId: string) {
  return useQuery(piecePoursQueryOptions(pieceId));
}
