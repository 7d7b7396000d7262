import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { shelfKeys } from './keys';

/** The API archives rather than deletes: saved plans and lots keep pointing at it. */
export function archiveResinSystem(resinSystemId: string): Promise<void> {
  return callRoute('archiveResinSystem', { params: { id: resinSystemId } });
}

export function useArchiveResinSystem({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archiveResinSystem,
    onSuccess: async (_result, resinSystemId) => {
      await queryClient.invalidateQueries({ queryKey: shelfKeys.resinSystem(resinSystemId) });
      await queryClient.invalidateQueries({ queryKey: shelfKeys.resinSystemLists() });
      await onSuccess?.();
    },
  });
}
