import { PourView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pourKeys } from './keys';

export interface StartPourInput {
  pourPlanId: string;
  notifyUserIds: string[];
}

export function startPour(input: StartPourInput): Promise<PourView> {
  return callRoute('startPour', { body: input });
}

export function useStartPour({ onSuccess }: { onSuccess?: (pour: PourView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startPour,
    onSuccess: async (pour) => {
      queryClient.setQueryData(pourKeys.detail(pour.id), pour);
      await queryClient.invalidateQueries({ queryKey: pourKeys.lists() });
      await queryClient.invalidateQueries({ queryKey: pourKeys.today() });
      await onSuccess?.(pour);
    },
  });
}
