import { MoldView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { analysisPollInterval } from '../utils/mold-status';
import { moldKeys } from './keys';

export function getMold(moldId: string, signal?: AbortSignal): Promise<MoldView> {
  return api.get(`/molds/${encodeURIComponent(moldId)}`, MoldView, signal ? { signal } : {});
}

export const moldQueryOptions = (moldId: string) =>
  queryOptions({
    queryKey: moldKeys.detail(moldId),
    queryFn: ({ signal }) => getMold(moldId, signal),
    refetchInterval: (query) => analysisPollInterval(query.state.data?.status),
  });

export function useMold(moldId: string) {
  return useQuery(moldQueryOptions(moldId));
}
