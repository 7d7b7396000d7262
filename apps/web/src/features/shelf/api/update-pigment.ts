import { PigmentView, type PigmentInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { shelfKeys } from './keys';
import { callRoute } from '../../../lib/api-routes';
import { refreshLots } from '../../../lib/resources/lots';

export interface UpdatePigmentInput {
  pigmentId: string;
  /** The whole entry: the API replaces it, it does not merge. */
  values: PigmentInput;
}

export function updatePigment({ pigmentId, values }: UpdatePigmentInput): Promise<PigmentView> {
  return callRoute('replacePigment', { params: { id: pigmentId }, body: values });
}

export function useUpdatePigment({ onSuccess }: { onSuccess?: (pigment: PigmentView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePigment,
    onSuccess: async (pigment) => {
      queryClient.setQueryData(shelfKeys.pigment(pigment.id), pigment);
      // Lots show the product's name.
      await queryClient.invalidateQueries({ queryKey: shelfKeys.pigmentLists() });
      await refreshLots(queryClient);
      await onSuccess?.(pigment);
    },
  });
}
