import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { teamKeys } from './keys';

export function revokeInvitation(invitationId: string): Promise<void> {
  return api.delete(`/shop/invitations/${encodeURIComponent(invitationId)}`);
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: teamKeys.invitations() });
    },
  });
}
