import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { forgetPourPlan } from '../../../lib/resources/pour-plans';

export function deletePourPlan(planId: string): Promise<void> {
  return callRoute('deletePourPlan', { params: { id: planId } });
}

export function useDeletePourPlan({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePourPlan,
    onSuccess: async (_result, planId) => {
      await onSuccess?.();
      await forgetPourPlan(queryClient, planId);
    },
  });
}
