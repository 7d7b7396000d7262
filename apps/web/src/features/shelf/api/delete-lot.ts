import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

/** For a lot entered by mistake; a lot that was used up stays, with nothing remaining. */
export function deleteLot(lotId: string): Promise<void> {
  return api.delete(`/shelf/lots/${encodeURIComponent(lotId)}`);
}

export function useDeleteLot({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLot,
    onSuccess: async (_result, lotId) => {
      await onSuccess?.();
      queryClient.removeQueries({ queryKey: shelfKeys.lot(lotId) });
      await queryClient.invalidateQueries({ queryKey: shelfKeys.lotLists() });
    },
  });
}
