import { Piece, type CreatePieceRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pieceKeys } from './keys';

export function createPiece(body: CreatePieceRequest): Promise<Piece> {
  return callRoute('createPiece', { body });
}

export function useCreatePiece({ onSuccess }: { onSuccess?: (piece: Piece) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPiece,
    onSuccess: async (piece) => {
      queryClient.setQueryData(pieceKeys.detail(piece.id), piece);
      await queryClient.invalidateQueries({ queryKey: pieceKeys.lists() });
      await onSuccess?.(piece);
    },
  });
}
