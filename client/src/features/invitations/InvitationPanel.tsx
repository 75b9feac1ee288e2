import type { ReactNode } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { InvitationLookup } from '../../../../shared/api/invitations';
import type { UserView } from '../../../../shared/api/auth';
import { Button, buttonClasses } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { roleNames, roleSummaries } from '../../shared/lib/roles';
import { useAcceptInvitation, useInvitationLookup } from './api';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'long', timeStyle: 'short' });
const linkClass = 'font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800';

/** A link that cannot be used: what happened, in words, and where to go instead. */
function Refusal({ code, title, children }: { code: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby="invitation-title" className="flex flex-col items-start gap-4">
      <p className="font-mono text-sm tracking-wide text-russet-700">{code}</p>
      <h1 id="invitation-title" className="text-4xl font-semibold">
        {title}
      </h1>
      <div className="flex flex-col gap-3 text-lg text-loam-700">{children}</div>
      <Link to="/" className={buttonClasses('secondary')}>
        Go to Seedwake
      </Link>
    </section>
  );
}

function Pending({
  token,
  invitation,
  user,
  signOut,
}: {
  token: string;
  invitation: InvitationLookup;
  user: UserView | null;
  signOut: ReactNode;
}) {
  const accept = useAcceptInvitation(token);
  const navigate = useNavigate();
  const here = `/invitations/${token}`;
  const signIn = `/sign-in?next=${encodeURIComponent(here)}`;
  const signUp = `/sign-up?invitation=${encodeURIComponent(token)}`;
  // The auth pages prefill the address from history state (never the URL): { email }.
  const prefill = { email: invitation.email };

  return (
    <section aria-labelledby="invitation-title" className="flex flex-col gap-6">
      <div className="flex flex-col gap-3">
        <p className="text-sm font-semibold tracking-wide text-russet-700 uppercase">Invitation</p>
        <h1 id="invitation-title" className="text-4xl font-semibold">
          {invitation.invitedBy
            ? `${invitation.invitedBy} invited you to ${invitation.workspaceName}`
            : `You are invited to ${invitation.workspaceName}`}
        </h1>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-seed border border-silt-300 bg-silt-50 px-4 py-3">
        <dt className="text-loam-700">Role</dt>
        <dd>
          <span className="font-medium">{roleNames[invitation.role]}.</span> {roleSummaries[invitation.role]}
        </dd>
        <dt className="text-loam-700">For</dt>
        <dd className="font-medium break-words">{invitation.email}</dd>
        <dt className="text-loam-700">Link works until</dt>
        <dd className="font-medium">
          <time dateTime={invitation.expiresAt}>{when.format(new Date(invitation.expiresAt))}</time>, once
        </dd>
      </dl>

      {user && user.email === invitation.email ? (
        <div className="flex flex-col gap-4">
          <FormAlert error={accept.error} />
          <Button
            pending={accept.isPending}
            pendingLabel="Joining…"
            onClick={() =>
              accept.mutate(undefined, {
                onSuccess: ({ workspace }) => void navigate(`/w/${workspace.id}`, { replace: true }),
              })
            }
          >
            Join {invitation.workspaceName}
          </Button>
        </div>
      ) : null}

      {user && user.email !== invitation.email ? (
        <div className="flex flex-col items-start gap-3 rounded-seed border-l-4 border-clay-500 bg-clay-100 px-4 py-3">
          <p>
            You are signed in as <span className="font-medium">{user.email}</span>, but this invitation is for{' '}
            <span className="font-medium">{invitation.email}</span>. Sign out, then open the link from the
            e-mail again and sign in or sign up with that address.
          </p>
          {signOut}
        </div>
      ) : null}

      {!user && invitation.accountExists ? (
        <div className="flex flex-col gap-3">
          <Link to={signIn} state={prefill} className={buttonClasses('primary')}>
            Sign in to accept
          </Link>
          <p className="text-sm text-loam-700">An account with {invitation.email} exists already.</p>
        </div>
      ) : null}

      {!user && !invitation.accountExists ? (
        <div className="flex flex-col gap-3">
          <Link to={signUp} state={prefill} className={buttonClasses('primary')}>
            Create your account
          </Link>
          <p className="text-sm text-loam-700">
            It takes a name and a password. Already have an account with this address?{' '}
            <Link to={signIn} state={prefill} className={linkClass}>
              Sign in
            </Link>
          </p>
        </div>
      ) : null}
    </section>
  );
}

/**
 * The page an invitation e-mail links to. The app composes it with the session and the
 * signed-out frame, which live in the auth feature.
 */
export function InvitationPanel({
  token,
  user,
  signOut,
}: {
  token: string;
  user: UserView | null;
  signOut: ReactNode;
}) {
  const lookup = useInvitationLookup(token);

  if (lookup.isPending) return <LoadingNotice>Reading the invitation…</LoadingNotice>;
  if (lookup.isError) {
    const e = lookup.error;
    if (e instanceof ApiRequestError && (e.status === 404 || e.status === 400)) {
      return (
        <Refusal code="404 · no such invitation" title="This invitation link does not work">
          <p>
            It may be mistyped or cut short — copy the whole link from the e-mail — or it was replaced by a
            newer invitation: look for a later e-mail from Seedwake.
          </p>
        </Refusal>
      );
    }
    return (
      <ErrorNotice
        title="Seedwake could not read the invitation"
        error={e}
        onRetry={() => void lookup.refetch()}
      />
    );
  }

  const invitation = lookup.data;
  const who = invitation.invitedBy ?? 'the workspace’s owners';
  switch (invitation.state) {
    case 'pending':
      return <Pending token={token} invitation={invitation} user={user} signOut={signOut} />;
    case 'expired':
      return (
        <Refusal code="410 · expired" title="This invitation has expired">
          <p>
            The invitation to {invitation.workspaceName} worked until{' '}
            {when.format(new Date(invitation.expiresAt))}. Ask {who} to send it again from the workspace’s
            members page; the new e-mail will carry a fresh link.
          </p>
        </Refusal>
      );
    case 'accepted':
      return (
        <Refusal code="410 · already used" title="This invitation has already been used">
          <p>
            Each invitation link works once. If it was you who used it, sign in: {invitation.workspaceName} is
            in your list of workspaces.
          </p>
          <p>
            <Link to="/sign-in" className={linkClass}>
              Sign in
            </Link>
          </p>
        </Refusal>
      );
    case 'revoked':
      return (
        <Refusal code="410 · withdrawn" title="This invitation was withdrawn">
          <p>
            The owners of {invitation.workspaceName} withdrew it. If you still need access, ask {who} to
            invite you again.
          </p>
        </Refusal>
      );
  }
}
