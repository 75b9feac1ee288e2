import { useId, useState } from 'react';
import type { LessonView } from '../../../../shared/api/lessons';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { useCreateClassLink, useRevokeClassLink } from './api';

const when = (iso: string) =>
  new Date(iso).toLocaleString('en-US', { dateStyle: 'medium', timeStyle: 'short' });

/**
 * The class link: made, copied and revoked here. Seedwake keeps only a fingerprint of
 * the link, so the full address is shown once, right after it is made.
 */
export function SharePanel({ workspaceId, lesson }: { workspaceId: string; lesson: LessonView }) {
  const create = useCreateClassLink(workspaceId, lesson.id);
  const revoke = useRevokeClassLink(workspaceId, lesson.id);
  const [fresh, setFresh] = useState<string | null>(null);
  const [copied, setCopied] = useState(false);
  const inputId = useId();
  const url = fresh ? `${window.location.origin}/class/${fresh}` : null;

  const make = () =>
    create.mutate(undefined, {
      onSuccess: (made) => {
        setFresh(made.token);
        setCopied(false);
      },
    });
  const copy = async () => {
    if (!url) return;
    try {
      await navigator.clipboard.writeText(url);
      setCopied(true);
    } catch {
      // Clipboard access can be refused; the address stays selected in the box for copying by hand.
      document.getElementById(inputId)?.focus();
    }
  };

  return (
    <section
      aria-labelledby="share-title"
      className="flex flex-col gap-3 rounded-seed border border-clay-300 bg-clay-100/40 p-5 print:hidden"
    >
      <h2 id="share-title" className="text-xl font-semibold">
        Class link
      </h2>
      <p className="max-w-prose text-sm text-loam-700">
        Anyone with the link can open this lesson without signing in — only this lesson, its profile’s
        parameters and its species card; nothing else in the workspace. Students’ slider moves stay in their
        own browser.
      </p>
      {url ? (
        <div className="flex flex-col gap-2">
          <label htmlFor={inputId} className="font-medium text-humus-900">
            The class link (shown once — copy it now)
          </label>
          <div className="flex flex-wrap gap-2">
            <input
              id={inputId}
              readOnly
              value={url}
              onFocus={(e) => e.target.select()}
              className="min-h-11 min-w-0 flex-1 rounded-seed border border-loam-400 bg-white px-3 font-mono text-sm"
            />
            <Button variant="secondary" onClick={() => void copy()}>
              {copied ? 'Copied' : 'Copy link'}
            </Button>
            <a
              href={url}
              target="_blank"
              rel="noreferrer"
              className="inline-flex min-h-11 items-center px-2 font-medium text-russet-700 underline"
            >
              Open<span className="sr-only"> the class link in a new tab</span>
            </a>
          </div>
          <p role="status" className="sr-only">
            {copied ? 'The class link is on the clipboard.' : ''}
          </p>
        </div>
      ) : lesson.link ? (
        <p className="text-humus-900">
          A link is live (starts <code className="font-mono">{lesson.link.prefix}…</code>, made{' '}
          {when(lesson.link.createdAt)}). Lost it? Make a new one: the old one stops working.
        </p>
      ) : (
        <p className="text-humus-900">No class link yet.</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button onClick={make} pending={create.isPending} pendingLabel="Making the link…">
          {lesson.link || url ? 'Make a new link' : 'Make a class link'}
        </Button>
        {lesson.link ? (
          <Button
            variant="danger"
            pending={revoke.isPending}
            pendingLabel="Revoking…"
            onClick={() => revoke.mutate(undefined, { onSuccess: () => setFresh(null) })}
          >
            Revoke the link
          </Button>
        ) : null}
      </div>
      <FormAlert error={create.error ?? revoke.error} />
    </section>
  );
}
