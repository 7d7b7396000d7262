import type { ApiRoutes, RouteResponse } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pourKeys, type LotChoicesQuery } from './keys';

export type LotChoices = RouteResponse<ApiRoutes['listLots']>;

/** Every lot of one part of one product, expired ones included: the mixing form offers those with stock left. */
export function getLotChoices(query: LotChoicesQuery, signal?: AbortSignal): Promise<LotChoices> {
  return callRoute('listLots', { query: { ...query, status: 'all', limit: 100 } }, signal ? { signal } : {});
}

export const lotChoicesQueryOptions = (query: LotChoicesQuery) =>
  queryOptions({
    queryKey: pourKeys.lotChoices(query),
    queryFn: ({ signal }) => getLotChoices(query, signal),
  });

export function useLotChoices(query: LotChoicesQuery | null) {
  return useQuery({ ...lotChoicesQueryOptions(query ?? { part: 'A', productId: '' }), enabled: query !== null });
}
