import { useQuery } from '@tanstack/react-query';
import { shopQueryOptions } from '../../../lib/resources/shop';

export function useShop() {
  return useQuery(shopQueryOptions());
}
