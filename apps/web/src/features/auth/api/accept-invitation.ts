import { SessionResponse, type AcceptInvitationRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export interface AcceptInvitationInput {
  token: string;
  body: AcceptInvitationRequest;
}

export function acceptInvitation({ token, body }: AcceptInvitationInput): Promise<SessionResponse> {
  return api.post(`/invitations/${encodeURIComponent(token)}/accept`, body, SessionResponse);
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
