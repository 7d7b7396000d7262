import type { ApiRoutes, RouteQueryInput } from '@gelpoint/contracts';
import { queryOptions } from '@tanstack/react-query';
import { callRoute } from '../api-routes';

export type PourListQuery = NonNullable<RouteQueryInput<ApiRoutes['listPours']>>;

// Every page of pours, whatever the filter (the cure board, a piece's pours, a plan's latest pour), lives under one
// root: starting, logging or releasing a pour refreshes them all with one invalidation.
export const pourListKeys = {
  all: ['pours'] as const,
  lists: () => [...pourListKeys.all, 'list'] as const,
  list: (query: PourListQuery) => [...pourListKeys.lists(), query] as const,
};

export const pourListQueryOptions = (query: PourListQuery) =>
  queryOptions({
    queryKey: pourListKeys.list(query),
    queryFn: ({ signal }) => callRoute('listPours', { query }, signal ? { signal } : {}),
  });
