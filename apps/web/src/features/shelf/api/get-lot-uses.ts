import type { ApiRoutes, RouteResponse } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

export type LotUses = RouteResponse<ApiRoutes['lotUses']>;

export const lotUsesPageSize = 50;

export function getLotUses(lotId: string, page: number, signal?: AbortSignal): Promise<LotUses> {
  return callRoute('lotUses', { params: { id: lotId }, query: { limit: lotUsesPageSize, offset: (page - 1) * lotUsesPageSize } }, signal ? { signal } : {});
}

export const lotUsesQueryOptions = (lotId: string, page: number) =>
  queryOptions({
    queryKey: shelfKeys.lotUses(lotId, page),
    queryFn: ({ signal }) => getLotUses(lotId, page, signal),
  });

export function useLotUses(lotId: string, page: number) {
  return useQuery(lotUsesQueryOptions(lotId, page));
}
