import { createInvitationBody, INVITATION_DAYS } from '../../../../shared/api/invitations';
import { EmailRoleForm } from '../../shared/components/EmailRoleForm';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { roleNames } from '../../shared/lib/roles';
import { useInvite } from './api';

const day = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** "Already a member" and "already invited" are about the address, so they sit beside it. */
const isAboutTheEmail = (error: unknown): error is ApiRequestError =>
  error instanceof ApiRequestError && error.status === 409;

/** Owners invite an address with a role; viewer is preselected, the least a person can be given. */
export function InviteForm({ workspaceId }: { workspaceId: string }) {
  const invite = useInvite(workspaceId);
  return (
    <EmailRoleForm
      titleId="invite-title"
      title="Invite by e-mail"
      lead={`Seedwake e-mails a link that works once, for ${INVITATION_DAYS} days. Someone without an account creates one from it; someone with an account signs in and joins.`}
      initialRole="viewer"
      schema={createInvitationBody}
      mutation={invite}
      submitLabel="Send invitation"
      pendingLabel="Sending…"
      isAboutTheEmail={isAboutTheEmail}
      describe={(invitation) =>
        `Invitation sent to ${invitation.email} as ${roleNames[invitation.role].toLowerCase()}. The link works until ${day.format(new Date(invitation.expiresAt))}.`
      }
    />
  );
}
