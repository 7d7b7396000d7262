import { LotView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

export function getLot(lotId: string, signal?: AbortSignal): Promise<LotView> {
  return callRoute('getLot', { params: { id: lotId } }, signal ? { signal } : {});
}

export const lotQueryOptions = (lotId: string) =>
  queryOptions({
    queryKey: shelfKeys.lot(lotId),
    queryFn: ({ signal }) => getLot(lotId, signal),
  });

export function useLot(lotId: string) {
  return useQuery(lotQueryOptions(lotId));
}
