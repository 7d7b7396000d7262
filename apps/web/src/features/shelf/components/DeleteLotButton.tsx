import type { LotView } from '@gelpoint/contracts';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useDeleteLot } from '../api/delete-lot';

export function DeleteLotButton({ lot, onDeleted }: { lot: LotView; onDeleted: () => unknown }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeleteLot({ onSuccess: onDeleted });
  return (
    <>
      <Button variant="danger" onClick={() => setAsking(true)}>
        Remove lot
      </Button>
      <ConfirmDialog
        open={asking}
        title={`Remove lot ${lot.lotNumber}?`}
        confirmLabel="Remove for good"
        cancelLabel="Keep it"
        busy={remove.isPending}
        error={remove.isError ? <ErrorAlert error={remove.error} /> : null}
        onCancel={() => {
          remove.reset();
          setAsking(false);
        }}
        onConfirm={() => remove.mutate(lot.id)}
      >
        Only for a lot entered by mistake. A lot that was used up should stay, with nothing left, so batches can still be traced to it.
      </ConfirmDialog>
    </>
  );
}
