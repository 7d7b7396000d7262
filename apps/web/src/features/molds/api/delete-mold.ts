import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { forgetMold } from '../../../lib/resources/molds';

export function deleteMold(moldId: string): Promise<void> {
  return callRoute('deleteMold', { params: { id: moldId } });
}

export function useDeleteMold({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteMold,
    onSuccess: async (_result, moldId) => {
      // Leave the page first, then forget the mould, so its page never renders without it.
      await onSuccess?.();
      await forgetMold(queryClient, moldId);
    },
  });
}
