import { useMemo } from 'react';
import { useProfiles } from '../features/profiles/api';
import { EditLessonPage, NewLessonPage } from '../features/lessons/LessonPages';
import type { ProfileOption } from '../features/lessons/LessonBuilder';
import { LoadingNotice } from '../shared/components/Notice';
import { useCurrentWorkspace } from '../shared/lib/currentWorkspace';

/*
 * The lesson builder offers the workspace's species profiles (its own and the built-in
 * ones). They come from the profiles feature, so the two meet here; if the list fails,
 * the builder still opens, offering no profile.
 */
function useProfileOptions(): ProfileOption[] | null {
  const workspace = useCurrentWorkspace();
  const profiles = useProfiles(workspace.id);
  return useMemo(() => {
    if (profiles.isPending) return null;
    return (profiles.data ?? []).map((p) => ({ id: p.id, name: p.name }));
  }, [profiles.isPending, profiles.data]);
}

export function NewLessonRoute() {
  const profiles = useProfileOptions();
  return profiles ? <NewLessonPage profiles={profiles} /> : <LoadingNotice>Loading…</LoadingNotice>;
}

export function EditLessonRoute() {
  const profiles = useProfileOptions();
  return profiles ? (
    <EditLessonPage profiles={profiles} />
  ) : (
    <LoadingNotice>Loading the lesson…</LoadingNotice>
  );
}
