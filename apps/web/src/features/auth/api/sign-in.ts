import { SessionResponse, type LoginRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';

export function signIn(body: LoginRequest): Promise<SessionResponse> {
  return callRoute('login', { body });
}

export function useSignIn({ onSuccess }: { onSuccess?: (session: SessionResponse) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    meta: { publicRequest: true },
    onSuccess: async (session) => {
      // Whatever was cached belonged to nobody or to someone else.
      queryClient.removeQueries();
      await onSuccess?.(session);
    },
  });
}
