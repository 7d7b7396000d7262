import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useDeletePourPlan } from '../api/delete-pour-plan';

export function DeletePourPlanButton({ planId, name, onDeleted }: { planId: string; name: string; onDeleted: () => unknown }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeletePourPlan({ onSuccess: onDeleted });
  return (
    <>
      <Button variant="danger" onClick={() => setAsking(true)}>
        Delete plan
      </Button>
      <ConfirmDialog
        open={asking}
        title={`Delete “${name}”?`}
        confirmLabel="Delete for good"
        cancelLabel="Keep it"
        busy={remove.isPending}
        error={remove.isError ? <ErrorAlert error={remove.error} /> : null}
        onCancel={() => {
          remove.reset();
          setAsking(false);
        }}
        onConfirm={() => remove.mutate(planId)}
      >
        The plan, its stored numbers and its run sheet go for everyone in the shop. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
