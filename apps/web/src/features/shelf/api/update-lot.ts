import { LotUpdate, LotView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

export interface UpdateLotInput {
  lotId: string;
  changes: z.input<typeof LotUpdate>;
}

export function updateLot({ lotId, changes }: UpdateLotInput): Promise<LotView> {
  return api.patch(`/shelf/lots/${encodeURIComponent(lotId)}`, changes, LotView);
}

export function useUpdateLot({ onSuccess }: { onSuccess?: (lot: LotView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateLot,
    onSuccess: async (lot) => {
      queryClient.setQueryData(shelfKeys.lot(lot.id), lot);
      await queryClient.invalidateQueries({ queryKey: shelfKeys.lotLists() });
      await onSuccess?.(lot);
    },
  });
}
