import { useParams } from 'react-router-dom';
import { templateSpecs } from '../../../../shared/lessons/templates';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { PageTitle } from '../../shared/components/Panel';
import { Wordmark } from '../../shared/components/Wordmark';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { useClassLesson } from './api';
import { LessonExperience } from './LessonExperience';

/**
 * /class/:token — a lesson opened from its class link, signed out. It shows this lesson
 * and nothing else, and links nowhere inside the workspace.
 */
export function ClassLessonPage() {
  const { token = '' } = useParams();
  const query = useClassLesson(token);
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b-4 border-double border-loam-400 bg-silt-100 print:hidden">
        <div className="mx-auto flex max-w-page flex-wrap items-center justify-between gap-3 px-4 py-3 sm:px-6">
          <Wordmark />
          <p className="text-sm text-loam-700">
            A lesson shared with your class · read-only · no account needed
          </p>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-page flex-1 px-4 py-8 sm:px-6">
        {query.isPending ? (
          <LoadingNotice>Opening the lesson…</LoadingNotice>
        ) : query.isError ? (
          query.error instanceof ApiRequestError && query.error.status === 404 ? (
            <section className="flex max-w-xl flex-col gap-3 py-10">
              <title>Lesson not found · Seedwake</title>
              <h1 className="text-4xl font-semibold">This class link does not work</h1>
              <p className="text-lg text-loam-700">
                It may be mistyped, or the teacher may have replaced or revoked it. Ask them for the current
                link.
              </p>
            </section>
          ) : (
            <ErrorNotice
              title="Seedwake could not open the lesson"
              error={query.error}
              onRetry={() => void query.refetch()}
            />
          )
        ) : (
          <>
            <title>{`${query.data.title} · Seedwake lesson`}</title>
            <LessonExperience
              content={query.data}
              replayTarget={{ token }}
              photoUrl={(id) => `/api/class/${encodeURIComponent(token)}/photos/${id}`}
              header={
                <PageTitle
                  eyebrow={`Lesson · ${templateSpecs[query.data.definition.template].name}`}
                  title={query.data.title}
                  lead={query.data.profile ? `On the species “${query.data.profile.name}”.` : undefined}
                />
              }
            />
          </>
        )}
      </main>
    </div>
  );
}
