import { AccountPage } from '../features/account/AccountPage';
import { TokensSection } from '../features/account/TokensSection';
import { useWorkspaces } from '../features/workspaces/api';

/*
 * The account page with its API tokens. A token is made for one of the person's
 * workspaces, with a role no higher than theirs there; that list belongs to the
 * workspaces feature, so the two are put together here.
 */
export function AccountRoute() {
  const workspaces = useWorkspaces();
  const memberships = (workspaces.data ?? []).map((w) => ({ id: w.id, name: w.name, role: w.role }));
  return (
    <div className="flex flex-col gap-10">
      <AccountPage />
      <TokensSection memberships={memberships} />
    </div>
  );
}
