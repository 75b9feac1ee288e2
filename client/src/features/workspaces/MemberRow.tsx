import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { roles, type Role } from '../../../../shared/api/auth';
import type { MemberView } from '../../../../shared/api/workspaces';
import { Button } from '../../shared/components/Button';
import { SelectField } from '../../shared/components/SelectField';
import { roleNames } from '../../shared/lib/roles';
import { useChangeRole, useRemoveMember } from './api';

const roleOptions = roles.map((role) => ({ value: role, label: roleNames[role] }));
const joined = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

/** Lets a long address wrap before the @ on a narrow screen rather than mid-word. */
function EmailAddress({ email }: { email: string }) {
  const at = email.lastIndexOf('@');
  if (at <= 0) return <>{email}</>;
  return (
    <>
      {email.slice(0, at)}
      <wbr />
      {email.slice(at)}
    </>
  );
}

type MemberRowProps = { workspaceId: string; member: MemberView; isSelf: boolean; canManage: boolean };

/**
 * One member. Owners pick a new role and confirm it with Save, rather than the change
 * applying as the select moves: arrow keys on a closed select would otherwise fire a
 * request per step. Removal asks once more, in place.
 */
export function MemberRow({ workspaceId, member, isSelf, canManage }: MemberRowProps) {
  const [role, setRole] = useState<Role>(member.role);
  const [confirming, setConfirming] = useState(false);
  const changeRole = useChangeRole(workspaceId);
  const remove = useRemoveMember(workspaceId);
  const navigate = useNavigate();
  const failure = changeRole.error ?? remove.error;

  const removeMember = () =>
    remove.mutate(member.user.id, {
      // Leaving a workspace yourself takes you out of it.
      onSuccess: () => {
        if (isSelf) void navigate('/', { replace: true });
      },
    });

  return (
    <tr className="border-t border-silt-200 align-top">
      <th scope="row" className="py-3 pr-4 text-left font-medium">
        {member.user.name}
        {isSelf ? (
          <span className="ml-2 rounded-sm bg-silt-200 px-1.5 py-0.5 text-xs font-semibold text-loam-700">
            you
          </span>
        ) : null}
        <span className="block text-sm font-normal break-words text-loam-700">
          <EmailAddress email={member.user.email} />
        </span>
        <span className="block text-sm font-normal text-loam-700 sm:hidden">
          Joined <time dateTime={member.joinedAt}>{joined.format(new Date(member.joinedAt))}</time>
        </span>
      </th>
      <td className="py-3 pr-4">
        {canManage ? (
          <div className="flex flex-wrap items-center gap-2">
            <SelectField
              label={`Role of ${member.user.name}`}
              hideLabel
              size="sm"
              name="role"
              value={role}
              onChange={(event) => {
                setRole(event.target.value as Role);
                changeRole.reset();
              }}
              options={roleOptions}
            />
            {role !== member.role ? (
              <Button
                size="sm"
                pending={changeRole.isPending}
                pendingLabel="Saving…"
                onClick={() => changeRole.mutate({ userId: member.user.id, role })}
              >
                Save role
              </Button>
            ) : null}
          </div>
        ) : (
          <span>{roleNames[member.role]}</span>
        )}
      </td>
      <td className="hidden py-3 pr-4 text-loam-700 sm:table-cell">
        <time dateTime={member.joinedAt}>{joined.format(new Date(member.joinedAt))}</time>
      </td>
      {canManage ? (
        <td className="py-3 text-right sm:w-1">
          {confirming ? (
            <div
              className="flex flex-wrap justify-end gap-2"
              role="group"
              aria-label={`Confirm removing ${member.user.name}`}
            >
              <Button
                variant="danger"
                size="sm"
                pending={remove.isPending}
                pendingLabel="Removing…"
                onClick={removeMember}
              >
                {isSelf ? 'Leave workspace' : `Remove ${member.user.name}`}
              </Button>
              <Button variant="quiet" size="sm" onClick={() => setConfirming(false)}>
                Keep
              </Button>
            </div>
          ) : (
            <Button variant="quiet" size="sm" onClick={() => setConfirming(true)}>
              {isSelf ? 'Leave' : 'Remove'}
            </Button>
          )}
          {failure ? (
            <p role="alert" className="mt-2 text-left text-sm font-medium text-danger-700 sm:text-right">
              {failure.message}
            </p>
          ) : null}
        </td>
      ) : null}
    </tr>
  );
}
