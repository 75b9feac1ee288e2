import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { templateSpecs } from '../../../../shared/lessons/templates';
import { Button } from '../../shared/components/Button';
import { NotFoundNotice } from '../../shared/components/NotFoundNotice';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useCreateLesson, useDeleteLesson, useLesson, useUpdateLesson } from './api';
import { draftFromLesson, newDraft } from './builderDraft';
import { LessonBuilder, type ProfileOption } from './LessonBuilder';
import { LessonExperience } from './LessonExperience';
import { SharePanel } from './SharePanel';

function BackLink({ to, children }: { to: string; children: string }) {
  return (
    <Link
      to={to}
      className="self-start text-sm font-medium text-russet-700 underline underline-offset-4 print:hidden"
    >
      ← {children}
    </Link>
  );
}

function useLessonQuery() {
  const { lessonId = '' } = useParams();
  const workspace = useCurrentWorkspace();
  return { workspace, lessonId, query: useLesson(workspace.id, lessonId) };
}

function LessonLoadState({ query }: { query: ReturnType<typeof useLesson> }) {
  if (query.isPending) return <LoadingNotice>Loading the lesson…</LoadingNotice>;
  if (query.error instanceof ApiRequestError && query.error.status === 404)
    return <NotFoundNotice what="lesson" />;
  return (
    <ErrorNotice
      title="Seedwake could not load this lesson"
      error={query.error}
      onRetry={() => void query.refetch()}
    />
  );
}

/** /w/:workspaceId/lessons/:lessonId — the lesson itself, with its class link for editors. */
export function LessonPage() {
  const { workspace, query } = useLessonQuery();
  const remove = useDeleteLesson(workspace.id);
  const navigate = useNavigate();
  const [confirming, setConfirming] = useState(false);
  if (!query.data) return <LessonLoadState query={query} />;
  const lesson = query.data;
  const canEdit = workspace.role !== 'viewer';
  const profileId = lesson.profile?.id ?? '';
  return (
    <div className="flex flex-col gap-6">
      <title>{`${lesson.title} · Seedwake`}</title>
      <BackLink to={`/w/${workspace.id}/lessons`}>All lessons</BackLink>
      <LessonExperience
        content={lesson}
        replayTarget={{ workspaceId: workspace.id, lessonId: lesson.id }}
        photoUrl={(id) => `/api/workspaces/${workspace.id}/profiles/${profileId}/card/photos/${id}`}
        header={
          <PageTitle
            eyebrow={`Lesson · ${templateSpecs[lesson.definition.template].name}`}
            title={lesson.title}
            lead={lesson.profile ? `On the species profile “${lesson.profile.name}”.` : undefined}
          />
        }
      />
      {canEdit ? (
        <div className="flex flex-col gap-4 print:hidden">
          <SharePanel workspaceId={workspace.id} lesson={lesson} />
          <div className="flex flex-wrap items-center gap-3">
            <Link
              to={`/w/${workspace.id}/lessons/${lesson.id}/edit`}
              className="font-medium text-russet-700 underline"
            >
              Edit the lesson
            </Link>
            {confirming ? (
              <span
                role="group"
                aria-label="Confirm deleting the lesson"
                className="flex flex-wrap items-center gap-2"
              >
                <Button
                  variant="danger"
                  size="sm"
                  pending={remove.isPending}
                  pendingLabel="Deleting…"
                  onClick={() =>
                    remove.mutate(lesson.id, {
                      onSuccess: () => void navigate(`/w/${workspace.id}/lessons`, { replace: true }),
                    })
                  }
                >
                  Delete “{lesson.title}” and its class link
                </Button>
                <Button variant="quiet" size="sm" onClick={() => setConfirming(false)}>
                  Keep it
                </Button>
              </span>
            ) : (
              <Button variant="quiet" size="sm" onClick={() => setConfirming(true)}>
                Delete the lesson
              </Button>
            )}
          </div>
          {remove.error ? (
            <p role="alert" className="text-sm font-medium text-danger-700">
              {remove.error.message}
            </p>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}

/** /w/:workspaceId/lessons/new — a lesson from a template. The profiles come from the app, which owns that feature. */
export function NewLessonPage({ profiles }: { profiles: readonly ProfileOption[] }) {
  const workspace = useCurrentWorkspace();
  const create = useCreateLesson(workspace.id);
  const navigate = useNavigate();
  if (workspace.role === 'viewer') return <NotFoundNotice what="page" />;
  return (
    <div className="flex flex-col gap-6">
      <title>New lesson · Seedwake</title>
      <BackLink to={`/w/${workspace.id}/lessons`}>All lessons</BackLink>
      <PageTitle
        eyebrow="Teaching"
        title="New lesson"
        lead="Pick a template, fix what the class may move and where it starts, and write the questions you want them to answer."
      />
      <LessonBuilder
        initial={newDraft()}
        profiles={profiles}
        saving={create.isPending}
        saveError={create.error}
        submitLabel="Create the lesson"
        onSave={(body) =>
          create.mutateAsync(body).then((saved) => {
            void navigate(`/w/${workspace.id}/lessons/${saved.id}`, { replace: true });
            return saved;
          })
        }
      />
    </div>
  );
}

/** /w/:workspaceId/lessons/:lessonId/edit */
export function EditLessonPage({ profiles }: { profiles: readonly ProfileOption[] }) {
  const { workspace, lessonId, query } = useLessonQuery();
  const update = useUpdateLesson(workspace.id, lessonId);
  const navigate = useNavigate();
  if (workspace.role === 'viewer') return <NotFoundNotice what="page" />;
  if (!query.data) return <LessonLoadState query={query} />;
  return (
    <div className="flex flex-col gap-6">
      <title>{`Edit ${query.data.title} · Seedwake`}</title>
      <BackLink to={`/w/${workspace.id}/lessons/${lessonId}`}>Back to the lesson</BackLink>
      <PageTitle eyebrow="Teaching" title={`Edit “${query.data.title}”`} />
      <LessonBuilder
        key={query.data.updatedAt}
        initial={draftFromLesson(query.data)}
        profiles={profiles}
        saving={update.isPending}
        saveError={update.error}
        submitLabel="Save the lesson"
        onSave={(body) =>
          update.mutateAsync(body).then((saved) => {
            void navigate(`/w/${workspace.id}/lessons/${saved.id}`);
            return saved;
          })
        }
      />
    </div>
  );
}
