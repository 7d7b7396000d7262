import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { Textarea } from '../../../components/ui/Textarea';
import { useVoidEntry } from '../api/void-entry';

export interface VoidEntryButtonProps {
  pourId: string;
  kind: 'reading' | 'batch';
  id: string;
  /** What is voided, in words: "the reading of 70 °C at 14:05", "cup 2". */
  what: string;
}

/** Voids a logged entry with its reason. Nothing is erased: the entry and the reason stay in the history. */
export function VoidEntryButton({ pourId, kind, id, what }: VoidEntryButtonProps) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  const reasonId = useId();
  const voiding = useVoidEntry(pourId);
  const close = () => {
    voiding.reset();
    setOpen(false);
    setReason('');
    setMissing(false);
  };
  return (
    <>
      <Button variant="secondary" className="min-h-11!" onClick={() => setOpen(true)}>
        Void…
      </Button>
      <ConfirmDialog
        open={open}
        title={`Void ${what}?`}
        confirmLabel="Void it"
        cancelLabel="Keep it"
        busy={voiding.isPending}
        error={voiding.isError ? <ErrorAlert error={voiding.error} /> : null}
        onCancel={close}
        onConfirm={() => {
          if (reason.trim() === '') {
            setMissing(true);
            return;
          }
          voiding.mutate({ kind, id, reason: reason.trim() }, { onSuccess: close });
        }}
      >
        <p>
          A voided {kind === 'reading' ? 'reading' : 'cup'} stays in the log with your reason, but no longer counts in the cure
          {kind === 'batch' ? ', and its grams go back to their lots. The cup can then be logged again' : ''}.
        </p>
        <label htmlFor={reasonId} className="mt-3 block font-semibold">
          Why is it wrong?
        </label>
        <Textarea
          id={reasonId}
          rows={3}
          maxLength={500}
          value={reason}
          aria-invalid={missing || undefined}
          aria-describedby={missing ? `${reasonId}-error` : undefined}
          onChange={(e) => {
            setReason(e.target.value);
            setMissing(false);
          }}
        />
        {missing ? (
          <p id={`${reasonId}-error`} className="mt-1 font-semibold text-ember-700">
            Say why, so the log shows what happened.
          </p>
        ) : null}
      </ConfirmDialog>
    </>
  );
}
