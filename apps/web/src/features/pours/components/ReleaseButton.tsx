import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { ConfirmDialog } from '../../../components/ui/ConfirmDialog';
import { ErrorAlert } from '../../../components/ui/ErrorAlert';
import { useReleasePour } from '../api/release-pour';

/** The lead's release of a cured piece for machining, asked once more before it goes. */
export function ReleaseButton({ pourId, pieceName }: { pourId: string; pieceName: string }) {
  const [asking, setAsking] = useState(false);
  const release = useReleasePour({ onSuccess: () => setAsking(false) });
  return (
    <>
      <Button className="min-h-12!" onClick={() => setAsking(true)}>
        Release for machining
      </Button>
      <ConfirmDialog
        open={asking}
        tone="primary"
        title={`Release “${pieceName}” for machining?`}
        confirmLabel="Release it"
        cancelLabel="Not yet"
        busy={release.isPending}
        error={release.isError ? <ErrorAlert error={release.error} /> : null}
        onCancel={() => {
          release.reset();
          setAsking(false);
        }}
        onConfirm={() => release.mutate(pourId)}
      >
        The logged cure has reached the data sheet’s point (gaps in the log counted at the lower temperature). Once released, the piece shows as ready for the
        machine. Check a test spot first if anything about this pour was unusual.
      </ConfirmDialog>
    </>
  );
}
