import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pourRefreshMs } from '../../../lib/resources/pours';
import type { PourPage } from '../types';
import type { CureBoardQuery } from '../utils/cure-board-filters';
import { pourKeys } from './keys';

/** The board moves on its own as pours cure, as fast as each pour does. */
export const boardRefreshMs = pourRefreshMs;

export function getPours(query: CureBoardQuery, signal?: AbortSignal): Promise<PourPage> {
  return callRoute('listPours', { query: { ...query } }, signal ? { signal } : {});
}

export const poursQueryOptions = (query: CureBoardQuery) =>
  queryOptions({
    queryKey: pourKeys.list(query),
    queryFn: ({ signal }) => getPours(query, signal),
    placeholderData: keepPreviousData,
    refetchInterval: boardRefreshMs,
  });

export function usePours(query: CureBoardQuery) {
  return useQuery(poursQueryOptions(query));
}
