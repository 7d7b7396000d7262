import { ResinSystemView, type ResinSystemInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

export function createResinSystem(body: ResinSystemInput): Promise<ResinSystemView> {
  return api.post('/shelf/resin-systems', body, ResinSystemView);
}

export function useCreateResinSystem({ onSuccess }: { onSuccess?: (resinSystem: ResinSystemView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createResinSystem,
    onSuccess: async (resinSystem) => {
      queryClient.setQueryData(shelfKeys.resinSystem(resinSystem.id), resinSystem);
      await queryClient.invalidateQueries({ queryKey: shelfKeys.resinSystemLists() });
      await onSuccess?.(resinSystem);
    },
  });
}
