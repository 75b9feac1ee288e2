import { Link } from 'react-router-dom';
import type { Role } from '../../../../shared/api/auth';
import { Strata } from '../../shared/components/Strata';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { roleNames } from '../../shared/lib/roles';
import { useCurrentUser } from '../../shared/lib/session';

/** What each role lets a person do, in the words of the work rather than of permissions. */
const abilities: Record<Role, string[]> = {
  owner: [
    'Add people to this workspace and set whether they edit or only view.',
    'Build fields, species profiles and management strategies.',
    'Run seeded projections and sweeps, and share lessons and reports.',
  ],
  editor: [
    'Build fields, species profiles and management strategies.',
    'Run seeded projections and sweeps, and compare strategies side by side.',
    'Share lessons and reports with the people here.',
  ],
  viewer: [
    'Open the fields, projections and lessons shared in this workspace.',
    'Read the cautions and export reports, charts and tables.',
    'Ask an owner for the editor role if you need to change anything.',
  ],
};

/** The order of the work in Seedwake, from a field's records to a report for the grower. */
const workflow = [
  { title: 'Record a field', detail: 'Soil cores give the starting seedbank.' },
  { title: 'Pick a species profile', detail: 'Germination, decay, fecundity, with sources.' },
  { title: 'Build strategies', detail: 'Steps per year: tillage, herbicide, hand weeding.' },
  { title: 'Project and compare', detail: 'Seeded runs with bands, costs and depletion odds.' },
];

/** Lessons are not built yet; the card says so plainly and what comes next, with no sample data. */
const lessons = {
  what: 'A lesson is a focused page a class can open from a link, without an account, to watch a seedbank decay and refill.',
  next: {
    edit: 'Build one from a template, fix the slider ranges, add questions, then share its class link.',
    view: 'Lessons of this workspace are listed on the Lessons page.',
  },
};

/** The dashboard's header: the workspace, a greeting, how the work goes and what this role may do. */
export function WorkspaceOverview() {
  const workspace = useCurrentWorkspace();
  const user = useCurrentUser();
  const firstName = user.name.split(/\s+/)[0];

  return (
    <header className="overflow-hidden rounded-seed border border-silt-300 bg-white shadow-sheet">
      <Strata variant="band" labelled className="block h-36 w-full bg-silt-100 sm:h-44" />
      <div className="grid gap-8 p-6 sm:p-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex flex-col gap-3">
          <p className="text-sm font-semibold tracking-wide text-russet-700 uppercase">
            {workspace.personal ? 'Your own workspace' : 'Workspace'}
          </p>
          <h1 className="text-4xl leading-tight font-semibold sm:text-5xl">{workspace.name}</h1>
          <p className="max-w-prose text-lg text-loam-700">
            Welcome, {firstName}. This is where the fields, projections and lessons of this workspace live.
          </p>
          <div className="mt-4">
            <h2 className="font-sans text-sm font-semibold tracking-wide text-loam-700 uppercase">
              How the work goes
            </h2>
            <ol className="mt-3 grid gap-3 sm:grid-cols-2">
              {workflow.map((step, i) => (
                <li key={step.title} className="flex gap-3">
                  <span
                    className="flex size-7 shrink-0 items-center justify-center rounded-full border border-loam-400 font-display text-sm font-semibold"
                    aria-hidden="true"
                  >
                    {i + 1}
                  </span>
                  <span className="text-sm">
                    <span className="block font-semibold text-humus-900">{step.title}</span>
                    <span className="text-loam-700">{step.detail}</span>
                  </span>
                </li>
              ))}
            </ol>
          </div>
        </div>
        <div className="self-start rounded-seed bg-silt-100 p-5">
          <p className="flex items-baseline gap-2">
            <span className="text-loam-700">Your role</span>
            <span className="font-display text-2xl font-semibold">{roleNames[workspace.role]}</span>
          </p>
          <ul className="mt-3 flex list-none flex-col gap-2 text-humus-900">
            {abilities[workspace.role].map((line) => (
              <li key={line} className="flex gap-2">
                <span className="mt-2 size-1.5 shrink-0 rounded-full bg-russet-600" aria-hidden="true" />
                <span>{line}</span>
              </li>
            ))}
          </ul>
          {workspace.role === 'owner' ? (
            <Link
              to={`/w/${workspace.id}/members`}
              className="mt-4 inline-block font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
            >
              Manage members
            </Link>
          ) : null}
        </div>
      </div>
    </header>
  );
}

export function LessonsCard() {
  const workspace = useCurrentWorkspace();
  const mode = workspace.role === 'viewer' ? 'view' : 'edit';
  return (
    <section
      aria-labelledby="section-lessons"
      className="flex flex-col gap-3 rounded-seed border border-dashed border-loam-400 bg-silt-50 p-6"
    >
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="section-lessons" className="text-2xl font-semibold">
          Lessons
        </h2>
        <Link
          to={`/w/${workspace.id}/lessons`}
          className="text-sm font-medium text-russet-700 underline underline-offset-4"
        >
          Open lessons
        </Link>
      </div>
      <p className="text-loam-700">{lessons.what}</p>
      <p className="mt-auto border-t border-silt-300 pt-3 text-sm text-humus-900">{lessons.next[mode]}</p>
    </section>
  );
}
