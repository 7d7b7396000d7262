import { Member, type UpdateMemberRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shopResourceKeys } from '../../../lib/resources/shop';

export interface UpdateMemberInput {
  memberId: string;
  changes: UpdateMemberRequest;
}

export function updateMember({ memberId, changes }: UpdateMemberInput): Promise<Member> {
  return api.patch(`/shop/members/${encodeURIComponent(memberId)}`, changes, Member);
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
