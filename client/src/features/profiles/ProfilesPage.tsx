import { Link, useNavigate } from 'react-router-dom';
import type { ProfileView } from '../../../../shared/api/profiles';
import { Button, buttonClasses } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { formatNumber } from '../../shared/lib/parameterDraft';
import { useCopyProfile, useProfiles } from './api';

const lifeFormNames = { annual: 'Annual', biennial: 'Biennial', perennial: 'Perennial' } as const;
const percent = (fraction: number) => `${formatNumber(fraction * 100, 1)}%`;

/** The species profiles of a workspace: the built-in illustrative ones and the workspace's own. */
export function ProfilesPage() {
  const workspace = useCurrentWorkspace();
  const profiles = useProfiles(workspace.id);
  const canEdit = workspace.role !== 'viewer';

  return (
    <div className="flex flex-col gap-8">
      <title>{`Species profiles · ${workspace.name} · Seedwake`}</title>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <PageTitle
          eyebrow={workspace.name}
          title="Species profiles"
          lead="A profile holds a weed’s life history: seed production, germination, seed decay, establishment, survival and regrowth, each value with its source."
        />
        {canEdit ? (
          <Link to={`/w/${workspace.id}/profiles/new`} className={buttonClasses('primary')}>
            New profile
          </Link>
        ) : null}
      </div>
      {profiles.isPending ? (
        <LoadingNotice>Loading species profiles…</LoadingNotice>
      ) : profiles.isError ? (
        <ErrorNotice
          title="Seedwake could not load the species profiles"
          error={profiles.error}
          onRetry={() => void profiles.refetch()}
        />
      ) : (
        <>
          <ProfileList
            title="Your workspace’s profiles"
            empty={
              canEdit
                ? 'None yet. Copy a built-in profile below to start from its values, or start a new one from the catalogue defaults.'
                : 'None yet. Profiles the editors create appear here.'
            }
            profiles={profiles.data.filter((p) => !p.builtIn)}
            canEdit={canEdit}
          />
          <ProfileList
            title="Built-in illustrative profiles"
            lead="Invented for illustration and shared by every workspace; read-only. Copy one to edit its values."
            profiles={profiles.data.filter((p) => p.builtIn)}
            canEdit={canEdit}
          />
        </>
      )}
    </div>
  );
}

function ProfileList({
  title,
  lead,
  empty,
  profiles,
  canEdit,
}: {
  title: string;
  lead?: string;
  empty?: string;
  profiles: ProfileView[];
  canEdit: boolean;
}) {
  const id = `list-${title.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-2xl font-semibold">
        {title}
      </h2>
      {lead ? <p className="text-loam-700">{lead}</p> : null}
      {profiles.length === 0 ? (
        <p className="rounded-seed border border-dashed border-loam-400 bg-silt-50 p-5 text-loam-700">
          {empty}
        </p>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {profiles.map((p) => (
            <ProfileCard key={p.id} profile={p} canEdit={canEdit} />
          ))}
        </ul>
      )}
    </section>
  );
}

function ProfileCard({ profile, canEdit }: { profile: ProfileView; canEdit: boolean }) {
  const workspace = useCurrentWorkspace();
  const copy = useCopyProfile(workspace.id);
  const navigate = useNavigate();
  const p = profile.profile;
  const sourceCount = Object.keys(profile.sources).length;
  return (
    <li className="flex flex-col overflow-hidden rounded-seed border border-silt-300 bg-white shadow-sheet">
      {/* Two strata bars, shallow over deep, as wide as the share of seed still viable after ten years of decay alone. */}
      <div className="flex h-3" aria-hidden="true">
        <span
          className="bg-loam-600"
          style={{ width: `${Math.max(4, 100 * (1 - p.seedDecay.shallow) ** 10)}%` }}
        />
        <span className="flex-1 bg-silt-200" />
      </div>
      <div className="flex h-3" aria-hidden="true">
        <span
          className="bg-clay-500"
          style={{ width: `${Math.max(4, 100 * (1 - p.seedDecay.deep) ** 10)}%` }}
        />
        <span className="flex-1 bg-silt-200" />
      </div>
      <div className="flex flex-1 flex-col gap-3 p-5">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h3 className="text-xl font-semibold">
            <Link
              to={`/w/${workspace.id}/profiles/${profile.id}`}
              className="underline-offset-4 hover:text-russet-700 hover:underline"
            >
              {profile.name}
            </Link>
          </h3>
          {profile.builtIn ? (
            <span className="rounded-sm bg-clay-100 px-2 py-0.5 text-xs font-semibold tracking-wide text-clay-800 uppercase">
              Illustrative
            </span>
          ) : null}
        </div>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm">
          <dt className="text-loam-700">Life form</dt>
          <dd className="font-medium">{lifeFormNames[p.lifeForm]}</dd>
          <dt className="text-loam-700">Seeds per flowering plant</dt>
          <dd className="font-medium">{formatNumber(p.fecundity.maxSeedsPerPlant, 0)}</dd>
          <dt className="text-loam-700">Seed decay, shallow · deep</dt>
          <dd className="font-medium">
            {percent(p.seedDecay.shallow)} · {percent(p.seedDecay.deep)} per year
          </dd>
          <dt className="text-loam-700">Viable after 10 years, decay alone</dt>
          <dd className="font-medium">
            {percent((1 - p.seedDecay.shallow) ** 10)} · {percent((1 - p.seedDecay.deep) ** 10)}
          </dd>
          <dt className="text-loam-700">Sources noted</dt>
          <dd className="font-medium">{sourceCount === 0 ? 'none' : sourceCount}</dd>
        </dl>
        <div className="mt-auto flex flex-wrap items-center gap-2 pt-2">
          <Link to={`/w/${workspace.id}/profiles/${profile.id}`} className={buttonClasses('secondary', 'sm')}>
            {canEdit && !profile.builtIn ? 'Edit' : 'Open'}
            <span className="sr-only"> {profile.name}</span>
          </Link>
          {canEdit && profile.builtIn ? (
            <Button
              size="sm"
              pending={copy.isPending}
              pendingLabel="Copying…"
              onClick={() =>
                copy.mutate(profile.id, {
                  onSuccess: (copied) => void navigate(`/w/${workspace.id}/profiles/${copied.id}`),
                })
              }
            >
              Copy to edit<span className="sr-only"> {profile.name}</span>
            </Button>
          ) : null}
          {copy.error ? (
            <span role="alert" className="text-sm font-medium text-danger-700">
              {copy.error.message}
            </span>
          ) : null}
        </div>
      </div>
    </li>
  );
}
