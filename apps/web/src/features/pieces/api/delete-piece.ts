import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pieceKeys } from './keys';

export function deletePiece(pieceId: string): Promise<void> {
  return api.delete(`/pieces/${encodeURIComponent(pieceId)}`);
}

export function useDeletePiece({ onSuccess }: { onSuccess?: () => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePiece,
    onSuccess: async (_result, pieceId) => {
      // Leave the page first (onSuccess), then forget the piece, so its page never renders without it.
      await onSuccess?.();
      queryClient.removeQueries({ queryKey: pieceKeys.detail(pieceId) });
      await queryClient.invalidateQueries({ queryKey: pieceKeys.lists() });
    },
  });
}
