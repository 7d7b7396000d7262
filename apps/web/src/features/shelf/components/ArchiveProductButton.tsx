import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';

export interface ArchiveProductButtonProps {
  name: string;
  busy: boolean;
  error: unknown;
  archive: () => void;
  reset: () => void;
}

/** Archiving takes a product off the pickers; saved pour plans keep their snapshot and lots keep their product. */
export function ArchiveProductButton({ name, busy, error, archive, reset }: ArchiveProductButtonProps) {
  const [asking, setAsking] = useState(false);
  return (
    <>
      <Button variant="secondary" onClick={() => setAsking(true)}>
        Archive
      </Button>
      <ConfirmDialog
        open={asking}
        title={`Archive “${name}”?`}
        confirmLabel="Archive it"
        cancelLabel="Keep it on the shelf"
        tone="primary"
        busy={busy}
        error={error ? <ErrorAlert error={error} /> : null}
        onCancel={() => {
          reset();
          setAsking(false);
        }}
        onConfirm={archive}
      >
        New pour plans can no longer choose it. Saved plans keep the values they were made with, and its lots stay on the shelf.
      </ConfirmDialog>
    </>
  );
}
