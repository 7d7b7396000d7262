import type { ApiRoutes, PourView, RouteQueryInput } from '@gelpoint/contracts';
import { queryOptions } from '@tanstack/react-query';
import { callRoute } from '../api-routes';

export type PourListQuery = NonNullable<RouteQueryInput<ApiRoutes['listPours']>>;

/** A pour moves on its own as it cures; a minute is finer than any stage. */
export const pourRefreshMs = 60_000;

// Every page of pours, whatever the filter (the cure board, a piece's pours, a plan's latest pour), lives under one
// root, and every pour with its log (its page, its cure record) under one key each: starting, logging or releasing a
// pour refreshes them all with one invalidation.
export const pourResourceKeys = {
  all: ['pours'] as const,
  lists: () => [...pourResourceKeys.all, 'list'] as const,
  list: (query: PourListQuery) => [...pourResourceKeys.lists(), query] as const,
  details: () => [...pourResourceKeys.all, 'detail'] as const,
  detail: (pourId: string) => [...pourResourceKeys.details(), pourId] as const,
};

export const pourListQueryOptions = (query: PourListQuery) =>
  queryOptions({
    queryKey: pourResourceKeys.list(query),
    queryFn: ({ signal }) => callRoute('listPours', { query }, signal ? { signal } : {}),
  });

/** Every pour of one piece, whatever its state (at most 200: more than any piece is poured in). */
export const piecePoursQuery = (pieceId: string): PourListQuery => ({ pieceId, status: 'all', limit: 200, offset: 0 });

/** A piece's pours, as its page lists them and its cure record prints them. */
export const piecePoursQueryOptions = (pieceId: string) => queryOptions({ ...pourListQueryOptions(piecePoursQuery(pieceId)), refetchInterval: pourRefreshMs });

export function getPour(pourId: string, signal?: AbortSignal): Promise<PourView> {
  return callRoute('getPour', { params: { id: pourId } }, signal ? { signal } : {});
}

/** One pour with its whole log: its page and the cure record of its piece read it here. */
export const pourQueryOptions = (pourId: string) =>
  queryOptions({
    queryKey: pourResourceKeys.detail(pourId),
    queryFn: ({ signal }) => getPour(pourId, signal),
    refetchInterval: pourRefreshMs,
  });
