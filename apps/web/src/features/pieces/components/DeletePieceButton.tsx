import type { Piece } from '@gelpoint/contracts';
import { ConfirmDeleteButton } from '../../../components/ui/ConfirmDeleteButton';
import { useDeletePiece } from '../api/delete-piece';

export function DeletePieceButton({ piece, onDeleted }: { piece: Piece; onDeleted: () => unknown }) {
  const remove = useDeletePiece({ onSuccess: onDeleted });
  return (
    <ConfirmDeleteButton label="Delete piece" title={`Delete “${piece.name}”?`} deletion={remove} onConfirm={() => remove.mutate(piece.id)}>
      The piece and its notes leave the list for everyone in the shop. This cannot be undone.
    </ConfirmDeleteButton>
  );
}
