import { Shop, type UpdateShopRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shopResourceKeys } from '../../../lib/resources/shop';
import { shopKeys } from './keys';

export function updateShop(changes: UpdateShopRequest): Promise<Shop> {
  return callRoute('updateShop', { body: changes });
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
