import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pourPlanKeys } from './keys';

export function deletePourPlan(planId: string): Promise<void> {
  return api.delete(`/pour-plans/${encodeURIComponent(planId)}`);
}

export function useDeletePourPlan({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePourPlan,
    onSuccess: async (_result, planId) => {
      await onSuccess?.();
      queryClient.removeQueries({ queryKey: pourPlanKeys.detail(planId) });
      await queryClient.invalidateQueries({ queryKey: pourPlanKeys.lists() });
    },
  });
}
