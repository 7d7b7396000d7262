import { Page, ResinSystemView } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';
import type { ResinSystemListQuery } from '../utils/shelf-queries';
import { shelfKeys } from './keys';

export const ResinSystemPage = Page(ResinSystemView);
export type ResinSystemPage = z.infer<typeof ResinSystemPage>;

export function getResinSystems(query: ResinSystemListQuery, signal?: AbortSignal): Promise<ResinSystemPage> {
  return callRoute('listResinSystems', { query: { ...query } }, signal ? { signal } : {});
}

export const resinSystemsQueryOptions = (query: ResinSystemListQuery) =>
  queryOptions({
    queryKey: shelfKeys.resinSystemList(query),
    queryFn: ({ signal }) => getResinSystems(query, signal),
    placeholderData: keepPreviousData,
  });

export function useResinSystems(query: ResinSystemListQuery) {
  return useQuery(resinSystemsQueryOptions(query));
}
