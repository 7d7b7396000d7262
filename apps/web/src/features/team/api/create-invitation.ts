import { Invitation, type CreateInvitationRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { teamKeys } from './keys';

/** Sends the invitation e-mail; the person joins by opening its link. */
export function createInvitation(body: CreateInvitationRequest): Promise<Invitation> {
  return callRoute('createInvitation', { body });
}

export function useCreateInvitation({ onSuccess }: { onSuccess?: (invitation: Invitation) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: async (invitation) => {
      await queryClient.invalidateQueries({ queryKey: teamKeys.invitations() });
      await onSuccess?.(invitation);
    },
  });
}
