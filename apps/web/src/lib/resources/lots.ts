import type { ApiRoutes, RouteQueryInput } from '@gelpoint/contracts';
import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { callRoute } from '../api-routes';

export type LotListQuery = NonNullable<RouteQueryInput<ApiRoutes['listLots']>>;

// Every list of lots, the shelf's tab and the mixing form's lot pickers alike, is one cache entry per query under one
// root, and so is each lot with the batches that drew on it: a lot received, edited or deleted, a cup logged or voided
// (stock drawn down or given back) or a product renamed refreshes them all with one invalidation.
export const lotListKeys = {
  all: ['lots'] as const,
  lists: () => [...lotListKeys.all, 'list'] as const,
  list: (query: LotListQuery) => [...lotListKeys.lists(), query] as const,
  detail: (lotId: string) => [...lotListKeys.all, 'detail', lotId] as const,
  uses: (lotId: string, page: number) => [...lotListKeys.detail(lotId), 'uses', page] as const,
};

export const getLots = (query: LotListQuery, signal?: AbortSignal) => callRoute('listLots', { query }, signal ? { signal } : {});

export const lotListQueryOptions = (query: LotListQuery) =>
  queryOptions({
    queryKey: lotListKeys.list(query),
    queryFn: ({ signal }) => getLots(query, signal),
  });

/** After anything that changes what a lot shows, in a list or on its own page: its stock, its number, its product's name, its uses. */
export function refreshLots(queryClient: QueryClient): Promise<void> {
  return queryClient.invalidateQueries({ queryKey: lotListKeys.all });
}
