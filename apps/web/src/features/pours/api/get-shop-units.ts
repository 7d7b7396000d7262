import { Shop } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourKeys } from './keys';

/** The shop's units, scale step and off-ratio tolerance, which every number on these pages is shown with. */
export function getShop(signal?: AbortSignal): Promise<Shop> {
  return api.get('/shop', Shop, signal ? { signal } : {});
}

export const shopUnitsQueryOptions = () =>
  queryOptions({
    queryKey: pourKeys.shop(),
    queryFn: ({ signal }) => getShop(signal),
  });

export function useShopUnits() {
  return useQuery(shopUnitsQueryOptions());
}
