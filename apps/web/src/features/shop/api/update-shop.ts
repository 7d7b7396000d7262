import { Shop, type UpdateShopRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopResourceKeys } from '../../../lib/resources/shop';
import { shopKeys } from './keys';

export function updateShop(changes: UpdateShopRequest): Promise<Shop> {
  return api.patch('/shop', changes, Shop);
}

export function useUpdateShop({ onSuccess }: { onSuccess?: (shop: Shop) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShop,
    onSuccess: async (shop) => {
      queryClient.setQueryData(shopResourceKeys.shop(), shop);
      await queryClient.invalidateQueries({ queryKey: shopKeys.audit() });
      await onSuccess?.(shop);
    },
  });
}
