import { MoldList as MoldListSchema } from '@gelpoint/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { MoldList } from '../types';
import { isAnalysing } from '../utils/mold-status';
import { moldKeys, type MoldListQuery } from './keys';

export function getMolds(query: MoldListQuery, signal?: AbortSignal): Promise<MoldList> {
  return api.get('/molds', MoldListSchema, { query: { ...query }, ...(signal ? { signal } : {}) });
}

// The list only shows a status word, so it checks back less often than a mould's own page.
const listPollMs = 2000;

export const moldsQueryOptions = (query: MoldListQuery) =>
  queryOptions({
    queryKey: moldKeys.list(query),
    queryFn: ({ signal }) => getMolds(query, signal),
    placeholderData: keepPreviousData,
    refetchInterval: (q) => (q.state.data?.items.some((mold) => isAnalysing(mold.status)) ? listPollMs : false),
  });

export function useMolds(query: MoldListQuery) {
  return useQuery(moldsQueryOptions(query));
}
