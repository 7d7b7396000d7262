import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

/** The API archives rather than deletes: saved plans and lots keep pointing at it. */
export function archivePigment(pigmentId: string): Promise<void> {
  return callRoute('archivePigment', { params: { id: pigmentId } });
}

export function useArchivePigment({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archivePigment,
    onSuccess: async (_result, pigmentId) => {
      await queryClient.invalidateQueries({ queryKey: shelfKeys.pigment(pigmentId) });
      await queryClient.invalidateQueries({ queryKey: shelfKeys.pigmentLists() });
      await onSuccess?.();
    },
  });
}
