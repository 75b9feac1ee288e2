import { useParams } from 'react-router-dom';
import { useMe } from '../features/auth/api';
import { AuthFrame } from '../features/auth/AuthFrame';
import { SignOutButton } from '../features/auth/SignOutButton';
import { InvitationPanel } from '../features/invitations/InvitationPanel';
import { ErrorNotice, LoadingNotice } from '../shared/components/Notice';

/** /invitations/:token — public: the invitation, with the session (if any) from the auth feature. */
export function InvitationRoute() {
  const { token = '' } = useParams();
  const me = useMe();
  return (
    <AuthFrame>
      <title>Invitation · Seedwake</title>
      {me.isPending ? <LoadingNotice>Checking your session…</LoadingNotice> : null}
      {me.isError ? (
        <ErrorNotice
          title="Seedwake could not check your session"
          error={me.error}
          onRetry={() => void me.refetch()}
        />
      ) : null}
      {me.isSuccess ? (
        <InvitationPanel token={token} user={me.data?.user ?? null} signOut={<SignOutButton />} />
      ) : null}
    </AuthFrame>
  );
}
