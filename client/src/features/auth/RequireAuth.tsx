import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { CurrentUserContext } from '../../shared/lib/session';
import { useMe } from './api';
import { signInPathFor } from './returnTo';

/** Signed-in pages sit below this route: signed-out visitors go to sign in and come back after. */
export function RequireAuth() {
  const me = useMe();
  const location = useLocation();

  if (me.isPending) {
    return (
      <div className="mx-auto max-w-page px-4 py-10 sm:px-6">
        <LoadingNotice>Checking your session…</LoadingNotice>
      </div>
    );
  }
  if (me.isError) {
    return (
      <main className="mx-auto max-w-xl px-4 py-16 sm:px-6">
        <ErrorNotice
          title="Seedwake could not check your session"
          error={me.error}
          onRetry={() => void me.refetch()}
        />
      </main>
    );
  }
  if (me.data === null) return <Navigate to={signInPathFor(location)} replace />;

  return (
    <CurrentUserContext value={me.data.user}>
      <Outlet />
    </CurrentUserContext>
  );
}
