import type { ApiRoutes, RouteQueryInput } from '@gelpoint/contracts';
import { queryOptions, type QueryClient } from '@tanstack/react-query';
import { callRoute } from '../api-routes';

export type LotListQuery = NonNullable<RouteQueryInput<ApiRoutes['listLots']>>;

// Every list of lots, the shelf's tab and the mixing form's lot pickers alike, is one cache entry per query under one
// root: a lot received, edited or deleted, a cup logged or voided (stock drawn down or given back) or a product
// renamed refreshes them all with one invalidation.
export const lotListKeys = {
  all: ['lots'] as const,
  lists: () => [...lotListKeys.all, 'list'] as const,
  list: (query: LotListQuery) => [...lotListKeys.lists(), query] as const,
};

export const getLots = (query: LotListQuery, signal?: AbortSignal) => callRoute('listLots', { query }, signal ? { signal } : {});

export const lotListQueryOptions = (query: LotListQuery) =>
  queryOptions({
    queryKey: lotListKeys.list(query),
    queryFn: ({ signal }) => getLots(query, signal),
  });

/** After anything that changes what a lot list shows: its stock, its number, its product's name, or the lot itself. */
export function refreshLotLists(queryClient: QueryClient): Promise<void> {
  return queryClient.invalidateQueries({ queryKey: lotListKeys.lists() });
}
