import { Page, ResinSystemView } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import type { ShelfListQuery } from '../utils/shelf-queries';
import { shelfKeys } from './keys';

export const ResinSystemPage = Page(ResinSystemView);
export type ResinSystemPage = z.infer<typeof ResinSystemPage>;

export function getResinSystems(query: ShelfListQuery, signal?: AbortSignal): Promise<ResinSystemPage> {
  return api.get('/shelf/resin-systems', ResinSystemPage, { query: { ...query }, ...(signal ? { signal } : {}) });
}

export const resinSystemsQueryOptions = (query: ShelfListQuery) =>
  queryOptions({
    queryKey: shelfKeys.resinSystemList(query),
    queryFn: ({ signal }) => getResinSystems(query, signal),
    placeholderData: keepPreviousData,
  });

export function useResinSystems(query: ShelfListQuery) {
  return useQuery(resinSystemsQueryOptions(query));
}
