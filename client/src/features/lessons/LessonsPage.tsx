import { Link } from 'react-router-dom';
import { templateSpecs } from '../../../../shared/lessons/templates';
import { buttonClasses } from '../../shared/components/Button';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle, Panel } from '../../shared/components/Panel';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useLessons } from './api';

/** /w/:workspaceId/lessons — the workspace's lessons, and a new one for editors. */
export function LessonsPage() {
  const workspace = useCurrentWorkspace();
  const lessons = useLessons(workspace.id);
  const canEdit = workspace.role !== 'viewer';
  return (
    <div className="flex flex-col gap-6">
      <title>Lessons · Seedwake</title>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <PageTitle
          eyebrow="Teaching"
          title="Lessons"
          lead="Interactive pages for a class or a growers’ meeting: sliders that move the seedbank at once, a projector view, a handout, and a link students open without an account."
        />
        {canEdit ? (
          <Link to={`/w/${workspace.id}/lessons/new`} className={buttonClasses('primary')}>
            New lesson
          </Link>
        ) : null}
      </div>
      {lessons.isPending ? (
        <LoadingNotice>Loading the lessons…</LoadingNotice>
      ) : lessons.isError ? (
        <ErrorNotice
          title="Seedwake could not load the lessons"
          error={lessons.error}
          onRetry={() => void lessons.refetch()}
        />
      ) : lessons.data.length === 0 ? (
        <Panel>
          <p className="text-loam-700">No lessons yet.{canEdit ? ' Start one from a template.' : ''}</p>
        </Panel>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {lessons.data.map((lesson) => (
            <li key={lesson.id}>
              <Panel className="flex h-full flex-col gap-2">
                <p className="text-xs font-semibold tracking-wide text-russet-700 uppercase">
                  {templateSpecs[lesson.template].name}
                </p>
                <h2 className="text-xl font-semibold">
                  <Link
                    to={`/w/${workspace.id}/lessons/${lesson.id}`}
                    className="hover:text-russet-700 hover:underline"
                  >
                    {lesson.title}
                  </Link>
                </h2>
                <p className="text-sm text-loam-700">
                  {lesson.link ? 'Class link live' : 'No class link'} · updated{' '}
                  {new Date(lesson.updatedAt).toLocaleDateString('en-US', { dateStyle: 'medium' })}
                </p>
              </Panel>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
