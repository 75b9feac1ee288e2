import { Link } from 'react-router-dom';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useProfiles } from './api';

/** The workspace's species profiles in a dashboard card, built-in ones marked illustrative. */
export function ProfilesCard() {
  const workspace = useCurrentWorkspace();
  const profiles = useProfiles(workspace.id);
  return (
    <section
      aria-labelledby="profiles-card-title"
      className="flex flex-col gap-3 rounded-seed border border-silt-300 bg-white p-5 shadow-sheet"
    >
      <h2 id="profiles-card-title" className="text-2xl font-semibold">
        <Link to={`/w/${workspace.id}/profiles`} className="underline-offset-4 hover:underline">
          Species profiles
        </Link>
      </h2>
      {profiles.isPending ? (
        <LoadingNotice>Loading species profiles…</LoadingNotice>
      ) : profiles.isError ? (
        <ErrorNotice
          title="Species profiles could not be loaded"
          error={profiles.error}
          onRetry={() => void profiles.refetch()}
        />
      ) : (
        <ul className="flex flex-col divide-y divide-silt-200">
          {profiles.data.map((p) => (
            <li key={p.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
              <Link
                to={`/w/${workspace.id}/profiles/${p.id}`}
                className="font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
              >
                {p.name}
              </Link>
              {p.builtIn ? (
                <span className="rounded-sm bg-clay-100 px-1.5 py-0.5 text-xs font-semibold tracking-wide text-clay-800 uppercase">
                  Illustrative
                </span>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
