import { Button } from '../../../components/ui/Button';
import { errorNotice } from '../../../lib/error-notice';
import { useSignOut } from '../api/sign-out';

export function SignOutButton({ onSignedOut }: { onSignedOut: () => unknown }) {
  const signOut = useSignOut({ onSuccess: onSignedOut });
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <Button variant="secondary" onClick={() => signOut.mutate()} busy={signOut.isPending} busyLabel="Signing out…">
        Sign out
      </Button>
      {signOut.isError ? (
        <span role="alert" className="text-sm font-semibold text-resin-200">
          {errorNotice(signOut.error).message}
        </span>
      ) : null}
    </span>
  );
}
