import { ConfirmDeleteButton } from '../../../components/ui/ConfirmDeleteButton';
import { useDeleteMold } from '../api/delete-mold';

export function DeleteMoldButton({ mold, onDeleted }: { mold: { id: string; name: string }; onDeleted: () => unknown }) {
  const remove = useDeleteMold({ onSuccess: onDeleted });
  return (
    <ConfirmDeleteButton label="Delete mould" title={`Delete “${mold.name}”?`} deletion={remove} onConfirm={() => remove.mutate(mold.id)}>
      The mould file and its cavity report leave the shop for everyone. This cannot be undone.
    </ConfirmDeleteButton>
  );
}
