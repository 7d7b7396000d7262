import type { Piece } from '@gelpoint/contracts';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useDeletePiece } from '../api/delete-piece';

export function DeletePieceButton({ piece, onDeleted }: { piece: Piece; onDeleted: () => unknown }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeletePiece({ onSuccess: onDeleted });

  return (
    <>
      <Button variant="danger" onClick={() => setAsking(true)}>
        Delete piece
      </Button>
      <ConfirmDialog
        open={asking}
        title={`Delete “${piece.name}”?`}
        confirmLabel="Delete for good"
        cancelLabel="Keep it"
        busy={remove.isPending}
        error={remove.isError ? <ErrorAlert error={remove.error} /> : null}
        onCancel={() => {
          remove.reset();
          setAsking(false);
        }}
        onConfirm={() => remove.mutate(piece.id)}
      >
        The piece and its notes leave the list for everyone in the shop. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
