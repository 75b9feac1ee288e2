import { addMemberBody } from '../../../../shared/api/workspaces';
import { EmailRoleForm } from '../../shared/components/EmailRoleForm';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { roleNames } from '../../shared/lib/roles';
import { useAddMember } from './api';

/** "No account with that e-mail" and "already a member" are about the e-mail, so they sit beside it. */
function isAboutTheEmail(error: unknown): error is ApiRequestError {
  return error instanceof ApiRequestError && (error.status === 404 || error.status === 409);
}

export function AddMemberForm({ workspaceId }: { workspaceId: string }) {
  const add = useAddMember(workspaceId);
  return (
    <EmailRoleForm
      titleId="add-member-title"
      title="Add a member"
      lead="For people who have a Seedwake account already: they join at once, without an e-mail. Invite anyone else by e-mail above."
      initialRole="editor"
      schema={addMemberBody}
      mutation={add}
      submitLabel="Add member"
      pendingLabel="Adding…"
      isAboutTheEmail={isAboutTheEmail}
      describe={(member) => `${member.user.name} joined as ${roleNames[member.role].toLowerCase()}.`}
    />
  );
}
