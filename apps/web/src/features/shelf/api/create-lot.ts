import { LotView, type LotInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { refreshLots } from '../../../lib/resources/lots';
import { shelfKeys } from './keys';

export function createLot(body: LotInput): Promise<LotView> {
  return callRoute('createLot', { body });
}

export function useCreateLot({ onSuccess }: { onSuccess?: (lot: LotView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLot,
    onSuccess: async (lot) => {
      queryClient.setQueryData(shelfKeys.lot(lot.id), lot);
      await refreshLots(queryClient);
      await onSuccess?.(lot);
    },
  });
}
