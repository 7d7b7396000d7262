import { PigmentView, type PigmentInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { shelfKeys } from './keys';
import { api } from '../../../lib/api-client';

export interface UpdatePigmentInput {
  pigmentId: string;
  /** The whole entry: the API replaces it, it does not merge. */
  values: PigmentInput;
}

export function updatePigment({ pigmentId, values }: UpdatePigmentInput): Promise<PigmentView> {
  return api.put(`/shelf/pigments/${encodeURIComponent(pigmentId)}`, values, PigmentView);
}

export function useUpdatePigment({ onSuccess }: { onSuccess?: (pigment: PigmentView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePigment,
    onSuccess: async (pigment) => {
      queryClient.setQueryData(shelfKeys.pigment(pigment.id), pigment);
      // Lots show the product's name.
      await queryClient.invalidateQueries({ queryKey: shelfKeys.pigmentLists() });
      await queryClient.invalidateQueries({ queryKey: shelfKeys.lotLists() });
      await onSuccess?.(pigment);
    },
  });
}
