import { PourView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pourKeys } from './keys';
import { refreshPour } from './refresh-pour';

export function releasePour(pourId: string): Promise<PourView> {
  return callRoute('releasePour', { params: { id: pourId } });
}

export function useReleasePour({ onSuccess }: { onSuccess?: (pour: PourView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: releasePour,
    onSuccess: async (pour) => {
      queryClient.setQueryData(pourKeys.detail(pour.id), pour);
      await refreshPour(queryClient, pour.id);
      await onSuccess?.(pour);
    },
  });
}
