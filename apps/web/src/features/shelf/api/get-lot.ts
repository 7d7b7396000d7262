import { LotView } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

export function getLot(lotId: string, signal?: AbortSignal): Promise<LotView> {
  return api.get(`/shelf/lots/${encodeURIComponent(lotId)}`, LotView, signal ? { signal } : {});
}

export const lotQueryOptions = (lotId: string) =>
  queryOptions({
    queryKey: shelfKeys.lot(lotId),
    queryFn: ({ signal }) => getLot(lotId, signal),
  });

export function useLot(lotId: string) {
  return useQuery(lotQueryOptions(lotId));
}
