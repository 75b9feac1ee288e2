import { useState } from 'react';
import type { InvitationView } from '../../../../shared/api/invitations';
import { Button } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { roleNames } from '../../shared/lib/roles';
import { useInvitations, useResendInvitation, useRevokeInvitation } from './api';

const day = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

function InvitationRow({ workspaceId, invitation }: { workspaceId: string; invitation: InvitationView }) {
  const resend = useResendInvitation(workspaceId);
  const revoke = useRevokeInvitation(workspaceId);
  const [confirming, setConfirming] = useState(false);
  const [resent, setResent] = useState(false);
  const failure = resend.error ?? revoke.error;
  const expired = invitation.state === 'expired';

  return (
    <tr className="border-t border-silt-200 align-top">
      <th scope="row" className="py-3 pr-4 text-left font-medium break-words">
        {invitation.email}
        {invitation.invitedBy ? (
          <span className="block text-sm font-normal text-loam-700">
            Invited by {invitation.invitedBy.name}
          </span>
        ) : null}
      </th>
      <td className="py-3 pr-4">{roleNames[invitation.role]}</td>
      <td className="py-3 pr-4 text-loam-700">
        {expired ? (
          <span className="rounded-sm bg-clay-100 px-1.5 py-0.5 text-sm font-semibold text-clay-800">
            Expired {day.format(new Date(invitation.expiresAt))}
          </span>
        ) : (
          <>
            Until <time dateTime={invitation.expiresAt}>{day.format(new Date(invitation.expiresAt))}</time>
          </>
        )}
      </td>
      <td className="py-3 text-right sm:w-1">
        {confirming ? (
          <div
            className="flex flex-wrap justify-end gap-2"
            role="group"
            aria-label={`Confirm withdrawing the invitation to ${invitation.email}`}
          >
            <Button
              variant="danger"
              size="sm"
              pending={revoke.isPending}
              pendingLabel="Withdrawing…"
              onClick={() => revoke.mutate(invitation.id)}
            >
              Withdraw invitation
            </Button>
            <Button variant="quiet" size="sm" onClick={() => setConfirming(false)}>
              Keep
            </Button>
          </div>
        ) : (
          <div className="flex flex-wrap justify-end gap-2">
            <Button
              variant="secondary"
              size="sm"
              pending={resend.isPending}
              pendingLabel="Sending…"
              className="whitespace-nowrap"
              aria-label={`Send the invitation to ${invitation.email} again`}
              onClick={() => {
                setResent(false);
                resend.mutate(invitation.id, { onSuccess: () => setResent(true) });
              }}
            >
              Send again
            </Button>
            <Button
              variant="quiet"
              size="sm"
              aria-label={`Withdraw the invitation to ${invitation.email}`}
              onClick={() => setConfirming(true)}
            >
              Withdraw
            </Button>
          </div>
        )}
        {resent ? (
          <p role="status" className="mt-2 text-sm text-humus-900">
            Sent again with a new link; the old one no longer works.
          </p>
        ) : null}
        {failure ? (
          <p role="alert" className="mt-2 text-left text-sm font-medium text-danger-700 sm:text-right">
            {failure.message}
          </p>
        ) : null}
      </td>
    </tr>
  );
}

/** Invitations not yet used or withdrawn; an expired one can be sent again with a fresh link. */
export function InvitationsList({ workspaceId }: { workspaceId: string }) {
  const invitations = useInvitations(workspaceId);
  return (
    <section aria-labelledby="invitation-list-title">
      <h2 id="invitation-list-title" className="mb-3 text-xl font-semibold">
        Open invitations
      </h2>
      {invitations.isPending ? <LoadingNotice>Loading invitations…</LoadingNotice> : null}
      {invitations.isError ? (
        <ErrorNotice
          title="Seedwake could not load the invitations"
          error={invitations.error}
          onRetry={() => void invitations.refetch()}
        />
      ) : null}
      {invitations.data && invitations.data.length === 0 ? (
        <p className="text-loam-700">No open invitations. Accepted ones show up as members above.</p>
      ) : null}
      {invitations.data && invitations.data.length > 0 ? (
        <div className="relative overflow-x-auto rounded-seed border border-silt-300 bg-white px-4 shadow-sheet sm:px-6">
          <table className="w-full border-collapse text-left">
            <thead>
              <tr className="text-sm text-loam-700">
                <th scope="col" className="py-3 pr-4 font-semibold">
                  E-mail
                </th>
                <th scope="col" className="py-3 pr-4 font-semibold">
                  Role
                </th>
                <th scope="col" className="py-3 pr-4 font-semibold">
                  Link works
                </th>
                <th scope="col" className="py-3 text-right font-semibold">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {invitations.data.map((invitation) => (
                <InvitationRow key={invitation.id} workspaceId={workspaceId} invitation={invitation} />
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </section>
  );
}
