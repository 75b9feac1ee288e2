import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { OutboxMessage } from '../../../../shared/api/mail';
import { Button } from '../../shared/components/Button';
import { HorizonRule } from '../../shared/components/HorizonRule';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { Wordmark } from '../../shared/components/Wordmark';
import { ApiRequestError } from '../../shared/lib/apiFetch';
import { useOutbox } from './api';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'medium' });

/**
 * One message as HTML and as text. The HTML sits in a sandboxed frame with no permissions
 * at all: no scripts, no forms, no same-origin access, so a message cannot act on the app.
 */
function MessageView({ message }: { message: OutboxMessage }) {
  const [as, setAs] = useState<'html' | 'text'>(message.html ? 'html' : 'text');
  return (
    <article aria-labelledby="message-subject" className="flex min-w-0 flex-col gap-4">
      <header className="flex flex-col gap-1">
        <h2 id="message-subject" className="text-2xl font-semibold break-words">
          {message.subject || '(no subject)'}
        </h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm text-loam-700">
          <dt>To</dt>
          <dd className="break-words text-humus-900">{message.to}</dd>
          <dt>From</dt>
          <dd className="break-words text-humus-900">{message.from}</dd>
          <dt>Received</dt>
          <dd className="text-humus-900">
            <time dateTime={message.receivedAt}>{when.format(new Date(message.receivedAt))}</time>
          </dd>
        </dl>
      </header>
      <div role="group" aria-label="Show the message as" className="flex gap-2">
        {(['html', 'text'] as const).map((kind) => (
          <Button
            key={kind}
            size="sm"
            variant={as === kind ? 'primary' : 'secondary'}
            aria-pressed={as === kind}
            disabled={kind === 'html' && !message.html}
            onClick={() => setAs(kind)}
          >
            {kind === 'html' ? 'HTML' : 'Text'}
          </Button>
        ))}
      </div>
      {as === 'html' ? (
        <iframe
          title={`HTML of “${message.subject}”`}
          sandbox=""
          srcDoc={message.html}
          className="h-[36rem] w-full rounded-seed border border-silt-300 bg-white"
        />
      ) : (
        <pre className="overflow-x-auto rounded-seed border border-silt-300 bg-white p-4 font-mono text-sm whitespace-pre-wrap text-humus-900">
          {message.text}
        </pre>
      )}
    </article>
  );
}

/** /dev/outbox: every message the local fake SMTP server received. Development only. */
export function OutboxPage() {
  const outbox = useOutbox();
  const [selected, setSelected] = useState<number | null>(null);
  const messages = outbox.data ?? [];
  const current = messages.find((m) => m.id === selected) ?? messages[0];
  const absent = outbox.error instanceof ApiRequestError && outbox.error.status === 404;

  return (
    <div className="min-h-dvh">
      <title>Development outbox · Seedwake</title>
      <header className="bg-silt-100">
        <div className="mx-auto flex max-w-page items-center gap-4 px-4 py-3 sm:px-6">
          <Link to="/" className="inline-block rounded-seed" aria-label="Seedwake, home">
            <Wordmark />
          </Link>
          <span className="rounded-sm bg-clay-100 px-2 py-0.5 text-sm font-semibold text-clay-800">
            Development only
          </span>
        </div>
        <HorizonRule />
      </header>
      <main id="main" className="mx-auto flex max-w-page flex-col gap-6 px-4 py-8 sm:px-6">
        <div>
          <h1 className="text-3xl font-semibold sm:text-4xl">Outbox</h1>
          <p className="mt-2 max-w-prose text-lg text-loam-700">
            Every e-mail Seedwake sent, as the local stand-in for a mail service received it. Nothing here
            left this machine.
          </p>
        </div>
        {outbox.isPending ? <LoadingNotice>Loading the outbox…</LoadingNotice> : null}
        {absent ? (
          <p className="rounded-seed border-l-4 border-clay-500 bg-clay-100 px-4 py-3">
            This server sends real e-mail (production, or SMTP_URL is set), so it has no outbox to show.
          </p>
        ) : null}
        {outbox.isError && !absent ? (
          <ErrorNotice
            title="Seedwake could not load the outbox"
            error={outbox.error}
            onRetry={() => void outbox.refetch()}
          />
        ) : null}
        {outbox.data && messages.length === 0 ? <p className="text-loam-700">No messages yet.</p> : null}
        {current ? (
          <div className="grid gap-6 lg:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
            <nav aria-label="Messages">
              <ul className="flex flex-col divide-y divide-silt-200 rounded-seed border border-silt-300 bg-white">
                {messages.map((m) => (
                  <li key={m.id}>
                    <button
                      type="button"
                      aria-current={m.id === current.id ? 'true' : undefined}
                      onClick={() => setSelected(m.id)}
                      className={`flex w-full flex-col items-start gap-0.5 px-4 py-3 text-left hover:bg-silt-100 ${
                        m.id === current.id ? 'bg-silt-100' : ''
                      }`}
                    >
                      <span className="font-medium break-words text-humus-900">
                        {m.subject || '(no subject)'}
                      </span>
                      <span className="text-sm break-all text-loam-700">{m.to}</span>
                      <time dateTime={m.receivedAt} className="text-xs text-loam-600">
                        {when.format(new Date(m.receivedAt))}
                      </time>
                    </button>
                  </li>
                ))}
              </ul>
            </nav>
            <MessageView key={current.id} message={current} />
          </div>
        ) : null}
      </main>
    </div>
  );
}
