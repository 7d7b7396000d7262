import { Piece, type UpdatePieceRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { callRoute } from '../../../lib/api-routes';
import { pieceKeys } from './keys';

export interface UpdatePieceInput {
  pieceId: string;
  changes: UpdatePieceRequest;
}

export function updatePiece({ pieceId, changes }: UpdatePieceInput): Promise<Piece> {
  return callRoute('updatePiece', { params: { id: pieceId }, body: changes });
}

export function useUpdatePiece({ onSuccess }: { onSuccess?: (piece: Piece) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePiece,
    onSuccess: async (piece) => {
      queryClient.setQueryData(pieceKeys.detail(piece.id), piece);
      await queryClient.invalidateQueries({ queryKey: pieceKeys.lists() });
      await onSuccess?.(piece);
    },
  });
}
