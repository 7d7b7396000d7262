import { Shop } from '@gelpoint/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopKeys } from './keys';

export function getShop(signal?: AbortSignal): Promise<Shop> {
  return api.get('/shop', Shop, signal ? { signal } : {});
}

export const shopQueryOptions = () =>
  queryOptions({
    queryKey: shopKeys.detail(),
    queryFn: ({ signal }) => getShop(signal),
  });

export function useShop() {
  return useQuery(shopQueryOptions());
}
