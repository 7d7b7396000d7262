import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { refreshLots } from '../../../lib/resources/lots';
import { shelfKeys } from './keys';

/** For a lot entered by mistake; a lot that was used up stays, with nothing remaining. */
export function deleteLot(lotId: string): Promise<void> {
  return callRoute('deleteLot', { params: { id: lotId } });
}

export function useDeleteLot({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLot,
    onSuccess: async (_result, lotId) => {
      await onSuccess?.();
      queryClient.removeQueries({ queryKey: shelfKeys.lot(lotId) });
      await refreshLots(queryClient);
    },
  });
}
