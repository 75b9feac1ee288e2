import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { serverFieldErrors } from './forms';

export type Built<B> = { body: B | null; errors: Record<string, string> };

/**
 * State for an editor of a nested document (a profile, a field, a strategy). The draft
 * keeps everything as typed; `build` turns it into the body to save or into messages
 * keyed by field path, on every change. A message shows once its field has been edited
 * or a save was tried, so a fresh form is not covered in red. A message from the server
 * stays until that field is edited. Nothing typed is ever replaced by a failed save.
 *
 * `build` must be a stable function (defined at module level).
 */
export function useDraftForm<D, B>(
  initial: D,
  build: (draft: D) => Built<B>,
  /** Turns the server's `fields` keys into the draft's paths, where they differ. */
  fromServer: (fields: Record<string, string>, draft: D) => Record<string, string> = (fields) => fields,
) {
  const [draft, setDraft] = useState(initial);
  const [touched, setTouched] = useState<ReadonlySet<string>>(() => new Set());
  const [attempts, setAttempts] = useState(0);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [savedAt, setSavedAt] = useState<Date | null>(null);
  const formRef = useRef<HTMLFormElement>(null);

  const built = useMemo(() => build(draft), [build, draft]);

  // After a refused save, the first field with a message gets the focus.
  useEffect(() => {
    if (attempts === 0) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [attempts, serverErrors]);

  const errorAt = (path: string): string | undefined =>
    serverErrors[path] ?? (attempts > 0 || touched.has(path) ? built.errors[path] : undefined);

  /** Applies a change and marks `path` as edited (clearing the server's message for it). */
  const edit = useCallback((path: string, change: (draft: D) => D) => {
    setDraft(change);
    setSavedAt(null);
    setTouched((t) => (t.has(path) ? t : new Set(t).add(path)));
    setServerErrors((e) => {
      if (!(path in e)) return e;
      const rest = { ...e };
      delete rest[path];
      return rest;
    });
  }, []);

  /** Tries to save; resolves true when saved. */
  const submit = async (save: (body: B) => Promise<unknown>): Promise<boolean> => {
    setAttempts((n) => n + 1);
    if (!built.body) return false;
    try {
      await save(built.body);
      setSavedAt(new Date());
      setServerErrors({});
      return true;
    } catch (error) {
      setServerErrors(fromServer(serverFieldErrors(error), draft));
      return false;
    }
  };

  return {
    draft,
    setDraft,
    built,
    edit,
    errorAt,
    submit,
    formRef,
    /** Messages the person should see now: after a save attempt, every one. */
    showingAll: attempts > 0,
    serverErrors,
    savedAt,
    isTouched: (path: string) => touched.has(path),
  };
}
