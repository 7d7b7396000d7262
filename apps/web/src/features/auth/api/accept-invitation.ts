import { SessionResponse, type AcceptInvitationRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';

export interface AcceptInvitationInput {
  token: string;
  body: AcceptInvitationRequest;
}

export function acceptInvitation({ token, body }: AcceptInvitationInput): Promise<SessionResponse> {
  return callRoute('acceptInvitation', { params: { token }, body });
}

export function useAcceptInvitation({ onSuccess }: { onSuccess?: (session: SessionResponse) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    meta: { publicRequest: true },
    onSuccess: async (session) => {
      queryClient.removeQueries();
      await onSuccess?.(session);
    },
  });
}
