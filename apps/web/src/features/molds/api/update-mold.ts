import { MoldView, type UpdateMoldRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { moldKeys } from '../../../lib/resources/molds';

export interface UpdateMoldInput {
  moldId: string;
  changes: UpdateMoldRequest;
}

export function updateMold({ moldId, changes }: UpdateMoldInput): Promise<MoldView> {
  return callRoute('updateMold', { params: { id: moldId }, body: changes });
}

export function useUpdateMold({ onSuccess }: { onSuccess?: (mold: MoldView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMold,
    onSuccess: async (mold) => {
      queryClient.setQueryData(moldKeys.detail(mold.id), mold);
      // A new name, piece or frame shows on other pages too (lists, a piece's moulds, a planner's choice): all of
      // them ask again when next seen. A rare change, so the simple rule is the safe one; the save need not wait for it.
      void queryClient.invalidateQueries();
      await onSuccess?.(mold);
    },
  });
}
