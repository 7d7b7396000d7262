import { Member, type UpdateMemberRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shopResourceKeys } from '../../../lib/resources/shop';

export interface UpdateMemberInput {
  memberId: string;
  changes: UpdateMemberRequest;
}

export function updateMember({ memberId, changes }: UpdateMemberInput): Promise<Member> {
  return callRoute('updateMember', { params: { id: memberId }, body: changes });
}

export function useUpdateMember({ onSuccess }: { onSuccess?: (member: Member) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMember,
    onSuccess: async (member) => {
      await queryClient.invalidateQueries({ queryKey: shopResourceKeys.members() });
      await onSuccess?.(member);
    },
  });
}
