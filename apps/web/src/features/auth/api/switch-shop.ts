import { SessionResponse, type SwitchShopRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';

export function switchShop(body: SwitchShopRequest): Promise<SessionResponse> {
  return callRoute('switchShop', { body });
}

export function useSwitchShop({ onSuccess }: { onSuccess?: (session: SessionResponse) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: switchShop,
    onSuccess: async (session) => {
      // Every cached list belongs to the shop we just left.
      queryClient.removeQueries();
      await onSuccess?.(session);
    },
  });
}
