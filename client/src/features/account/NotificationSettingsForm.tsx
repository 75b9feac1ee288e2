import { useId, useState } from 'react';
import { LONG_PROJECTIONS } from '../../../../shared/api/notifications';
import { ErrorNotice, LoadingNotice } from '../../shared/components/Notice';
import { useChangeNotificationSettings, useNotificationSettings } from './api';

/** One choice, saved as it is ticked: whether long projections also end with an e-mail. */
export function NotificationSettingsForm() {
  const settings = useNotificationSettings();
  const change = useChangeNotificationSettings();
  const [saved, setSaved] = useState(false);
  const id = useId();

  return (
    <section aria-labelledby={`${id}-title`} className="flex flex-col gap-4">
      <h2 id={`${id}-title`} className="text-xl font-semibold">
        Notices
      </h2>
      <p id={`${id}-about`} className="text-sm text-loam-700">
        When projections you launch end — {LONG_PROJECTIONS.replicateYears.toLocaleString()} replicate-years
        or more (replicates × years, over the whole launch), or longer than {LONG_PROJECTIONS.seconds} s — a
        notice appears under Notices in the header. You can have an e-mail too.
      </p>
      {settings.isPending ? <LoadingNotice>Loading your settings…</LoadingNotice> : null}
      {settings.isError ? (
        <ErrorNotice
          title="Seedwake could not load your settings"
          error={settings.error}
          onRetry={() => void settings.refetch()}
        />
      ) : null}
      {settings.data ? (
        <div className="flex flex-col gap-3">
          <div className="flex items-start gap-3">
            <input
              id={id}
              type="checkbox"
              checked={settings.data.email}
              aria-describedby={`${id}-about`}
              onChange={(event) => {
                setSaved(false);
                change.mutate({ email: event.target.checked }, { onSuccess: () => setSaved(true) });
              }}
              className="mt-1 size-5 shrink-0 accent-humus-900"
            />
            <label htmlFor={id} className="font-medium text-humus-900">
              E-mail me when a long projection I launched finishes or fails
            </label>
          </div>
          {change.isError ? (
            <p role="alert" className="text-sm font-medium text-danger-700">
              Not saved: {change.error.message}
            </p>
          ) : null}
          {saved ? (
            <p role="status" className="text-sm font-medium">
              <span aria-hidden="true">✓ </span>Saved.
            </p>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
