import { Piece, type CreatePieceRequest } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { pieceKeys } from './keys';

export function createPiece(body: CreatePieceRequest): Promise<Piece> {
  return api.post('/pieces', body, Piece);
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
