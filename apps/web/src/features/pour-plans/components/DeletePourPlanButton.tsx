import { ConfirmDeleteButton } from '../../../components/ui/ConfirmDeleteButton';
import { useDeletePourPlan } from '../api/delete-pour-plan';

export function DeletePourPlanButton({ planId, name, onDeleted }: { planId: string; name: string; onDeleted: () => unknown }) {
  const remove = useDeletePourPlan({ onSuccess: onDeleted });
  return (
    <ConfirmDeleteButton label="Delete plan" title={`Delete “${name}”?`} deletion={remove} onConfirm={() => remove.mutate(planId)}>
      The plan, its stored numbers and its run sheet go for everyone in the shop. This cannot be undone.
    </ConfirmDeleteButton>
  );
}
