import { ResinSystemView, type ResinSystemInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { shelfKeys } from './keys';
import { callRoute } from '../../../lib/api-routes';
import { refreshLots } from '../../../lib/resources/lots';

export interface UpdateResinSystemInput {
  resinSystemId: string;
  /** The whole data sheet: the API replaces the entry, it does not merge. */
  values: ResinSystemInput;
}

export function updateResinSystem({ resinSystemId, values }: UpdateResinSystemInput): Promise<ResinSystemView> {
  return callRoute('replaceResinSystem', { params: { id: resinSystemId }, body: values });
}

export function useUpdateResinSystem({ onSuccess }: { onSuccess?: (resinSystem: ResinSystemView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateResinSystem,
    onSuccess: async (resinSystem) => {
      queryClient.setQueryData(shelfKeys.resinSystem(resinSystem.id), resinSystem);
      // Lots show the product's name.
      await queryClient.invalidateQueries({ queryKey: shelfKeys.resinSystemLists() });
      await refreshLots(queryClient);
      await onSuccess?.(resinSystem);
    },
  });
}
