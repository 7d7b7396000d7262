import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useDeleteMold } from '../api/delete-mold';

export function DeleteMoldButton({ mold, onDeleted }: { mold: { id: string; name: string }; onDeleted: () => unknown }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeleteMold({ onSuccess: onDeleted });

  return (
    <>
      <Button variant="danger" onClick={() => setAsking(true)}>
        Delete mould
      </Button>
      <ConfirmDialog
        open={asking}
        title={`Delete “${mold.name}”?`}
        confirmLabel="Delete for good"
        cancelLabel="Keep it"
        busy={remove.isPending}
        error={remove.isError ? <ErrorAlert error={remove.error} /> : null}
        onCancel={() => {
          remove.reset();
          setAsking(false);
        }}
        onConfirm={() => remove.mutate(mold.id)}
      >
        The STL and its cavity report leave the shop for everyone. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
