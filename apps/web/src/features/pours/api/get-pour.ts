import { PourView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { boardRefreshMs } from './get-pours';
import { pourKeys } from './keys';

export function getPour(pourId: string, signal?: AbortSignal): Promise<PourView> {
  return api.get(`/pours/${encodeURIComponent(pourId)}`, PourView, signal ? { signal } : {});
}

export const pourQueryOptions = (pourId: string) =>
  queryOptions({
    queryKey: pourKeys.detail(pourId),
    queryFn: ({ signal }) => getPour(pourId, signal),
    refetchInterval: boardRefreshMs,
  });

export function usePour(pourId: string) {
  return useQuery(pourQueryOptions(pourId));
}
