import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pieceKeys } from './keys';

export function deletePiece(pieceId: string): Promise<void> {
  return callRoute('deletePiece', { params: { id: pieceId } });
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
