import { PigmentView, type PigmentInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

export function createPigment(body: PigmentInput): Promise<PigmentView> {
  return callRoute('createPigment', { body });
}

export function useCreatePigment({ onSuccess }: { onSuccess?: (pigment: PigmentView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPigment,
    onSuccess: async (pigment) => {
      queryClient.setQueryData(shelfKeys.pigment(pigment.id), pigment);
      await queryClient.invalidateQueries({ queryKey: shelfKeys.pigmentLists() });
      await onSuccess?.(pigment);
    },
  });
}
