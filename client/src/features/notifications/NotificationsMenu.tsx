import { useEffect, useId, useRef, useState } from 'react';
import { Link, useLocation } from 'react-router-dom';
import type { NotificationView } from '../../../../shared/api/notifications';
import { useMarkRead, useNotifications } from './api';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function NoticeItem({ notice, onOpen }: { notice: NotificationView; onOpen: (n: NotificationView) => void }) {
  const unread = notice.readAt === null;
  const failed = notice.kind === 'projections_failed';
  const content = (
    <span className="flex items-start gap-2">
      <span
        className={`mt-1.5 size-2 shrink-0 rounded-full ${unread ? (failed ? 'bg-danger-700' : 'bg-russet-600') : 'bg-transparent'}`}
        aria-hidden="true"
      />
      <span className="flex min-w-0 flex-col gap-0.5">
        <span className={`${unread ? 'font-semibold' : 'font-medium'} text-humus-900`}>
          {unread ? <span className="sr-only">Unread: </span> : null}
          {notice.title}
        </span>
        <span className="line-clamp-3 text-sm whitespace-pre-line text-loam-700">{notice.body}</span>
        <time dateTime={notice.createdAt} className="text-xs text-loam-600">
          {when.format(new Date(notice.createdAt))}
        </time>
      </span>
    </span>
  );
  const className = 'block rounded-seed px-3 py-2.5 text-left hover:bg-silt-100';
  return (
    <li>
      {notice.link ? (
        <Link to={notice.link} className={className} onClick={() => onOpen(notice)}>
          {content}
        </Link>
      ) : (
        <button type="button" className={`${className} w-full`} onClick={() => onOpen(notice)}>
          {content}
        </button>
      )}
    </li>
  );
}

/**
 * The notices in the header: a button with the unread count that opens a short list.
 * Opening a notice marks it read. Same disclosure pattern as the workspace switcher.
 */
export function NotificationsMenu() {
  const notices = useNotifications();
  const markRead = useMarkRead();
  const location = useLocation();
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === location.pathname;
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const unread = notices.data?.unread ?? 0;

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpenOn(null);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        setOpenOn(null);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open]);

  const openNotice = (notice: NotificationView) => {
    if (notice.readAt === null) markRead.mutate(notice.id);
    if (!notice.link) setOpenOn(null);
  };

  return (
    <div
      ref={rootRef}
      className="relative"
      onBlur={(event) => {
        const next = event.relatedTarget as Node | null;
        if (next !== null && !rootRef.current?.contains(next)) setOpenOn(null);
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpenOn(open ? null : location.pathname)}
        className="relative flex min-h-9 items-center gap-1.5 rounded-seed px-2 py-1 text-sm font-medium hover:bg-silt-200/70"
      >
        {/* A seed with a sprouting tip: something new has come up. */}
        <svg viewBox="0 0 20 20" className="size-5 text-humus-900" aria-hidden="true">
          <ellipse cx="10" cy="12.5" rx="5.5" ry="4.5" fill="none" stroke="currentColor" strokeWidth="1.6" />
          <path
            d="M10 8 C10 5.5 11.5 3.5 14 3"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.6"
            strokeLinecap="round"
          />
        </svg>
        <span className="sr-only sm:not-sr-only">Notices</span>
        {unread > 0 ? (
          <span className="min-w-5 rounded-full bg-russet-700 px-1.5 text-center text-xs leading-5 font-semibold text-silt-50">
            {unread}
            <span className="sr-only"> unread</span>
          </span>
        ) : null}
      </button>
      <div
        id={panelId}
        hidden={!open}
        className="absolute top-full right-0 z-30 mt-2 w-[min(24rem,calc(100vw-2rem))] rounded-seed border border-silt-300 bg-white p-2 shadow-sheet"
      >
        <h2 className="px-3 pt-1 pb-2 text-sm font-semibold tracking-wide text-loam-700 uppercase">
          Notices
        </h2>
        {notices.isError ? (
          <p role="alert" className="px-3 py-2 text-sm text-danger-700">
            {notices.error.message}
          </p>
        ) : null}
        {notices.data && notices.data.items.length === 0 ? (
          <p className="px-3 py-2 text-sm text-loam-700">
            Nothing yet. When a long projection you launch ends, you hear about it here.
          </p>
        ) : null}
        {notices.data && notices.data.items.length > 0 ? (
          <ul className="flex max-h-[60vh] flex-col overflow-y-auto">
            {notices.data.items.map((notice) => (
              <NoticeItem key={notice.id} notice={notice} onOpen={openNotice} />
            ))}
          </ul>
        ) : null}
        <p className="border-t border-silt-200 px-3 pt-2 pb-1 text-xs text-loam-600">
          E-mail about them can be turned off on{' '}
          <Link to="/account" className="underline underline-offset-2">
            your account page
          </Link>
          .
        </p>
      </div>
    </div>
  );
}
