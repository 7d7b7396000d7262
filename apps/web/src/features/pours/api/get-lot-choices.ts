import type { ApiRoutes, RouteResponse } from '@gelpoint/contracts';
import { useQuery } from '@tanstack/react-query';
import { lotListQueryOptions } from '../../../lib/resources/lots';
import type { LotChoicesQuery } from './keys';

export type LotChoices = RouteResponse<ApiRoutes['listLots']>;

/** Every lot of one part of one product, expired ones included: the mixing form offers those with stock left. */
export const lotChoicesQueryOptions = (query: LotChoicesQuery) => lotListQueryOptions({ ...query, status: 'all', limit: 100 });

export function useLotChoices(query: LotChoicesQuery | null) {
  return useQuery({ ...lotChoicesQueryOptions(query ?? { part: 'A', productId: '' }), enabled: query !== null });
}
