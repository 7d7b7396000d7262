import type { LotView } from '@gelpoint/contracts';
import { ConfirmDeleteButton } from '../../../components/ui/ConfirmDeleteButton';
import { useDeleteLot } from '../api/delete-lot';

export function DeleteLotButton({ lot, onDeleted }: { lot: LotView; onDeleted: () => unknown }) {
  const remove = useDeleteLot({ onSuccess: onDeleted });
  return (
    <ConfirmDeleteButton
      label="Remove lot"
      title={`Remove lot ${lot.lotNumber}?`}
      confirmLabel="Remove for good"
      deletion={remove}
      onConfirm={() => remove.mutate(lot.id)}
    >
      Only for a lot entered by mistake. A lot that was used up should stay, with nothing left, so batches can still be traced to it.
    </ConfirmDeleteButton>
  );
}
