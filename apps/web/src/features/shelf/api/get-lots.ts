import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { lotListQueryOptions } from '../../../lib/resources/lots';
import type { LotListQuery } from '../utils/shelf-queries';

export const lotsQueryOptions = (query: LotListQuery) => queryOptions({ ...lotListQueryOptions({ ...query }), placeholderData: keepPreviousData });

export function useLots(query: LotListQuery) {
  return useQuery(lotsQueryOptions(query));
}
