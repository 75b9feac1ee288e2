import { Button } from '../../shared/components/Button';
import { useSignOut } from './api';

export function SignOutButton() {
  const signOut = useSignOut();
  return (
    <span className="inline-flex items-center gap-2">
      <Button
        variant="quiet"
        size="sm"
        pending={signOut.isPending}
        pendingLabel="Signing out…"
        onClick={() => signOut.mutate()}
      >
        Sign out
      </Button>
      {signOut.isError ? (
        <span role="alert" className="text-sm text-danger-700">
          Not signed out: {signOut.error.message}
        </span>
      ) : null}
    </span>
  );
}
