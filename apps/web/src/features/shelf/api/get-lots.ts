import { LotView, Page } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';
import type { LotListQuery } from '../utils/shelf-queries';
import { shelfKeys } from './keys';

export const LotPage = Page(LotView);
export type LotPage = z.infer<typeof LotPage>;

export function getLots(query: LotListQuery, signal?: AbortSignal): Promise<LotPage> {
  return callRoute('listLots', { query: { ...query } }, signal ? { signal } : {});
}

export const lotsQueryOptions = (query: LotListQuery) =>
  queryOptions({
    queryKey: shelfKeys.lotList(query),
    queryFn: ({ signal }) => getLots(query, signal),
    placeholderData: keepPreviousData,
  });

export function useLots(query: LotListQuery) {
  return useQuery(lotsQueryOptions(query));
}
