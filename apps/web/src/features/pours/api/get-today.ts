import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import type { Today } from '../types';
import { boardRefreshMs } from './get-pours';
import { pourKeys } from './keys';

export function getToday(signal?: AbortSignal): Promise<Today> {
  return callRoute('today', {}, signal ? { signal } : {});
}

export const todayQueryOptions = () =>
  queryOptions({
    queryKey: pourKeys.today(),
    queryFn: ({ signal }) => getToday(signal),
    refetchInterval: boardRefreshMs,
  });

export function useToday() {
  return useQuery(todayQueryOptions());
}
