import { useState, type ReactNode } from 'react';
import { Button } from './Button';
import { ConfirmDialog } from './ConfirmDialog';
import { ErrorAlert } from './ErrorAlert';

/** The part of a delete mutation the button shows: whether it is running, how it failed, and how to forget a failure. */
export interface DeletionState {
  isPending: boolean;
  isError: boolean;
  error: unknown;
  reset: () => void;
}

export interface ConfirmDeleteButtonProps {
  /** The danger button that opens the question, e.g. "Delete piece". */
  label: string;
  title: ReactNode;
  /** What goes for good, said inside the dialog. */
  children: ReactNode;
  confirmLabel?: string;
  cancelLabel?: string;
  deletion: DeletionState;
  onConfirm: () => void;
}

/** A danger button that asks before it deletes, and shows a failed delete inside the question. */
export function ConfirmDeleteButton({
  label,
  title,
  children,
  confirmLabel = 'Delete for good',
  cancelLabel = 'Keep it',
  deletion,
  onConfirm,
}: ConfirmDeleteButtonProps) {
  const [asking, setAsking] = useState(false);
  return (
    <>
      <Button variant="danger" onClick={() => setAsking(true)}>
        {label}
      </Button>
      <ConfirmDialog
        open={asking}
        title={title}
        confirmLabel={confirmLabel}
        cancelLabel={cancelLabel}
        busy={deletion.isPending}
        error={deletion.isError ? <ErrorAlert error={deletion.error} /> : null}
        onCancel={() => {
          deletion.reset();
          setAsking(false);
        }}
        onConfirm={onConfirm}
      >
        {children}
      </ConfirmDialog>
    </>
  );
}
