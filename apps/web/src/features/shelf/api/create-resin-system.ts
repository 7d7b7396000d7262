import { ResinSystemView, type ResinSystemInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

export function createResinSystem(body: ResinSystemInput): Promise<ResinSystemView> {
  return callRoute('createResinSystem', { body });
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
