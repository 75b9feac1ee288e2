import { Outlet, ScrollRestoration } from 'react-router-dom';
import { LoadingNotice } from '../shared/components/Notice';

export function RootLayout() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

/** Shown while the first page's code arrives. */
export function BootScreen() {
  return (
    <div className="mx-auto max-w-page px-4 py-10 sm:px-6">
      <LoadingNotice>Opening Seedwake…</LoadingNotice>
    </div>
  );
}
