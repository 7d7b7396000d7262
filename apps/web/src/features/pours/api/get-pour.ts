import { PourView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { boardRefreshMs } from './get-pours';
import { pourKeys } from './keys';

export function getPour(pourId: string, signal?: AbortSignal): Promise<PourView> {
  return callRoute('getPour', { params: { id: pourId } }, signal ? { signal } : {});
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
