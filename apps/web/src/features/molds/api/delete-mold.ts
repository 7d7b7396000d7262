import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { moldKeys } from './keys';

export function deleteMold(moldId: string): Promise<void> {
  return api.delete(`/molds/${encodeURIComponent(moldId)}`);
}

export function useDeleteMold({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteMold,
    onSuccess: async (_result, moldId) => {
      // Leave the page first, then forget the mould, so its page never renders without it.
      await onSuccess?.();
      queryClient.removeQueries({ queryKey: moldKeys.detail(moldId) });
      await queryClient.invalidateQueries({ queryKey: moldKeys.lists() });
    },
  });
}
