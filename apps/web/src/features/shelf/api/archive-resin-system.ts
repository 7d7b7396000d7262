import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { shelfKeys } from './keys';

/** The API archives rather than deletes: saved plans and lots keep pointing at it. */
export function archiveResinSystem(resinSystemId: string): Promise<void> {
  return api.delete(`/shelf/resin-systems/${encodeURIComponent(resinSystemId)}`);
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
