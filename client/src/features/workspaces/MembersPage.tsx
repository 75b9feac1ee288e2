import { roles } from '../../../../shared/api/auth';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { roleNames, roleSummaries } from '../../shared/lib/roles';
import { useCurrentUser } from '../../shared/lib/session';
import { useMembers } from './api';
import { AddMemberForm } from './AddMemberForm';
import { InvitationsList } from './InvitationsList';
import { InviteForm } from './InviteForm';
import { MemberRow } from './MemberRow';

/** Who is in the workspace and what each may do. Only owners see the controls; the server enforces the same. */
export function MembersPage() {
  const workspace = useCurrentWorkspace();
  const me = useCurrentUser();
  const members = useMembers(workspace.id);
  const canManage = workspace.role === 'owner';

  return (
    <div className="flex flex-col gap-8">
      <title>{`Members · ${workspace.name} · Seedwake`}</title>
      <PageTitle
        eyebrow={workspace.name}
        title="Members"
        lead={
          canManage
            ? 'Invite people by e-mail or add those who already have a Seedwake account, and set what each of them may do here.'
            : `Only owners change who is here and what they may do. You are ${workspace.role === 'editor' ? 'an editor' : 'a viewer'} in this workspace.`
        }
      />

      <dl className="grid gap-px overflow-hidden rounded-seed border border-silt-300 bg-silt-300 sm:grid-cols-3">
        {roles.map((role) => (
          <div key={role} className="bg-silt-50 px-4 py-3">
            <dt className="font-display text-lg font-semibold">{roleNames[role]}</dt>
            <dd className="mt-1 text-sm text-loam-700">{roleSummaries[role]}</dd>
          </div>
        ))}
      </dl>

      {canManage ? (
        <>
          <Panel>
            <InviteForm workspaceId={workspace.id} />
          </Panel>
          <Panel>
            <AddMemberForm workspaceId={workspace.id} />
          </Panel>
        </>
      ) : null}

      <section aria-labelledby="member-list-title">
        <h2 id="member-list-title" className="mb-3 text-xl font-semibold">
          {members.data
            ? `${members.data.length} ${members.data.length === 1 ? 'member' : 'members'}`
            : 'Members'}
        </h2>
        {members.isPending ? <LoadingNotice>Loading members…</LoadingNotice> : null}
        {members.isError ? (
          <ErrorNotice
            title="Seedwake could not load the members"
            error={members.error}
            onRetry={() => void members.refetch()}
          />
        ) : null}
        {members.data ? (
          <div className="relative overflow-x-auto rounded-seed border border-silt-300 bg-white px-4 shadow-sheet sm:px-6">
            <table className="w-full border-collapse text-left">
              <thead>
                <tr className="text-sm text-loam-700">
                  <th scope="col" className="py-3 pr-4 font-semibold">
                    Name and e-mail
                  </th>
                  <th scope="col" className="py-3 pr-4 font-semibold">
                    Role
                  </th>
                  {/* On narrow screens the joined date moves under the name instead of taking a column. */}
                  <th scope="col" className="hidden py-3 pr-4 font-semibold sm:table-cell">
                    Joined
                  </th>
                  {canManage ? (
                    <th scope="col" className="relative py-3 text-right font-semibold">
                      <span className="sr-only">Actions</span>
                    </th>
                  ) : null}
                </tr>
              </thead>
              <tbody>
                {members.data.map((member) => (
                  <MemberRow
                    // Keyed by role too, so a row starts fresh once the server confirms a new role.
                    key={`${member.user.id}:${member.role}`}
                    workspaceId={workspace.id}
                    member={member}
                    isSelf={member.user.id === me.id}
                    canManage={canManage}
                  />
                ))}
              </tbody>
            </table>
          </div>
        ) : null}
      </section>

      {canManage ? <InvitationsList workspaceId={workspace.id} /> : null}
    </div>
  );
}
