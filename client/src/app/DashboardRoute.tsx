import { LessonsCard, WorkspaceOverview } from '../features/dashboard/WorkspaceOverview';
import { FieldsCard } from '../features/fields/FieldsCard';
import { ProfilesCard } from '../features/profiles/ProfilesCard';
import { QuickStart } from '../features/projections/QuickStart';
import { RecentProjectionsCard } from '../features/projections/RecentProjectionsCard';
import { SharedWithYouCard } from '../features/projections/SharedWithYouCard';
import { useCurrentWorkspace } from '../shared/lib/currentWorkspace';

/*
 * The dashboard, composed here because it shows pieces of several features: the
 * workspace overview, a quick start into the newest finished comparison, the recent
 * projections, the fields and species profiles, and lessons (still to come).
 */
export function DashboardRoute() {
  const workspace = useCurrentWorkspace();
  return (
    <div className="flex flex-col gap-8">
      <title>{`${workspace.name} · Seedwake`}</title>
      <WorkspaceOverview />
      <SharedWithYouCard />
      <QuickStart />
      <div className="grid items-start gap-6 lg:grid-cols-3">
        <div className="lg:col-span-2">
          <RecentProjectionsCard />
        </div>
        <FieldsCard />
        <ProfilesCard />
        <LessonsCard />
      </div>
    </div>
  );
}
