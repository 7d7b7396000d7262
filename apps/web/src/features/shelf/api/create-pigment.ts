import { PigmentView, type PigmentInput } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

export function createPigment(body: PigmentInput): Promise<PigmentView> {
  return api.post('/shelf/pigments', body, PigmentView);
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
