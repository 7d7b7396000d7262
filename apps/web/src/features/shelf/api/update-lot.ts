import { LotUpdate, LotView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { callRoute } from '../../../lib/api-routes';
import { refreshLots } from '../../../lib/resources/lots';
import { shelfKeys } from './keys';

export interface UpdateLotInput {
  lotId: string;
  changes: z.input<typeof LotUpdate>;
}

export function updateLot({ lotId, changes }: UpdateLotInput): Promise<LotView> {
  return callRoute('updateLot', { params: { id: lotId }, body: changes });
}

export function useUpdateLot({ onSuccess }: { onSuccess?: (lot: LotView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateLot,
    onSuccess: async (lot) => {
      queryClient.setQueryData(shelfKeys.lot(lot.id), lot);
      await refreshLots(queryClient);
      await onSuccess?.(lot);
    },
  });
}
