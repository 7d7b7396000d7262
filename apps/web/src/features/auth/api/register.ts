import { SessionResponse, type RegisterRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';

/** Creates a shop with the person as its lead, and signs them in. */
export function registerShop(body: RegisterRequest): Promise<SessionResponse> {
  return callRoute('register', { body });
}

export function useRegisterShop({ onSuccess }: { onSuccess?: (session: SessionResponse) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: registerShop,
    meta: { publicRequest: true },
    onSuccess: async (session) => {
      queryClient.removeQueries();
      await onSuccess?.(session);
    },
  });
}
