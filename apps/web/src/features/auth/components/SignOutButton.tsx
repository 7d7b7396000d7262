import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { errorNotice } from '../../../lib/error-notice';
import { useOutboxEntries } from '../../../lib/offline/outbox-context';
import { useSignOut } from '../api/sign-out';

export function SignOutButton({ onSignedOut }: { onSignedOut: () => unknown }) {
  const signOut = useSignOut({ onSuccess: onSignedOut });
  const unsent = useOutboxEntries().length;
  const [asking, setAsking] = useState(false);
  // What was logged on this phone and not sent goes with the sign-out (nothing of the shop stays on the device):
  // say so first, never silently.
  const start = () => (unsent > 0 && !asking ? setAsking(true) : signOut.mutate());
  return (
    <span className="inline-flex flex-col items-end gap-1">
      {asking ? (
        <span role="alert" className="max-w-xs text-right text-sm font-semibold text-resin-200">
          {unsent === 1 ? '1 entry logged on this phone has' : `${unsent} entries logged on this phone have`} not reached the server. Signing out deletes
          {unsent === 1 ? ' it' : ' them'}.
        </span>
      ) : null}
      <span className="inline-flex flex-wrap justify-end gap-2">
        {asking ? (
          <Button variant="secondary" onClick={() => setAsking(false)}>
            Stay signed in
          </Button>
        ) : null}
        <Button variant="secondary" onClick={start} busy={signOut.isPending} busyLabel="Signing out…">
          {asking ? 'Sign out anyway' : 'Sign out'}
        </Button>
      </span>
      {signOut.isError ? (
        <span role="alert" className="text-sm font-semibold text-resin-200">
          {errorNotice(signOut.error).message}
        </span>
      ) : null}
    </span>
  );
}
