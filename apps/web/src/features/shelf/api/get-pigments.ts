import { Page, PigmentView } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';
import type { PigmentListQuery } from '../utils/shelf-queries';
import { shelfKeys } from './keys';

export const PigmentPage = Page(PigmentView);
export type PigmentPage = z.infer<typeof PigmentPage>;

export function getPigments(query: PigmentListQuery, signal?: AbortSignal): Promise<PigmentPage> {
  return callRoute('listPigments', { query: { ...query } }, signal ? { signal } : {});
}

export const pigmentsQueryOptions = (query: PigmentListQuery) =>
  queryOptions({
    queryKey: shelfKeys.pigmentList(query),
    queryFn: ({ signal }) => getPigments(query, signal),
    placeholderData: keepPreviousData,
  });

export function usePigments(query: PigmentListQuery) {
  return useQuery(pigmentsQueryOptions(query));
}
