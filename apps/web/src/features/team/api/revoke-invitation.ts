import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { teamKeys } from './keys';

export function revokeInvitation(invitationId: string): Promise<void> {
  return callRoute('revokeInvitation', { params: { id: invitationId } });
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
