import { Link, NavLink, Outlet, useMatch } from 'react-router-dom';
import { SignOutButton } from '../features/auth/SignOutButton';
import { NotificationsMenu } from '../features/notifications/NotificationsMenu';
import { WorkspaceSwitcher } from '../features/workspaces/WorkspaceSwitcher';
import { HorizonRule } from '../shared/components/HorizonRule';
import { UnitsSwitch } from '../shared/components/UnitsSwitch';
import { Wordmark } from '../shared/components/Wordmark';
import { useCurrentUser } from '../shared/lib/session';

const navLinkClass = ({ isActive }: { isActive: boolean }) =>
  `relative inline-flex min-h-11 items-center px-1 font-medium text-humus-900 hover:text-russet-700 ${
    isActive
      ? 'after:absolute after:inset-x-0 after:bottom-1 after:h-[3px] after:rounded-full after:bg-russet-600'
      : ''
  }`;

/** The frame of every signed-in page. The header is screen-only: printouts carry the page alone. */
export function AppShell() {
  const user = useCurrentUser();
  const inWorkspace = useMatch('/w/:workspaceId/*');
  const workspaceId = inWorkspace?.params.workspaceId;

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only z-50 rounded-seed bg-humus-900 px-4 py-2 text-silt-50 focus:not-sr-only focus:absolute focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <header className="bg-silt-100 print:hidden">
        <div className="mx-auto flex max-w-page flex-wrap items-center gap-x-6 gap-y-3 px-4 py-3 sm:px-6">
          <Link to="/" className="rounded-seed" aria-label="Seedwake, your workspace">
            <Wordmark />
          </Link>
          <div className="order-last flex w-full flex-wrap items-center gap-x-5 gap-y-2 lg:order-none lg:w-auto lg:flex-1">
            <WorkspaceSwitcher />
            {workspaceId ? (
              <nav aria-label="Workspace" className="flex flex-wrap items-center gap-x-4">
                <NavLink to={`/w/${workspaceId}`} end className={navLinkClass}>
                  Overview
                </NavLink>
                <NavLink to={`/w/${workspaceId}/fields`} className={navLinkClass}>
                  Fields
                </NavLink>
                <NavLink to={`/w/${workspaceId}/profiles`} className={navLinkClass}>
                  Profiles
                </NavLink>
                <NavLink to={`/w/${workspaceId}/strategies`} className={navLinkClass}>
                  Strategies
                </NavLink>
                <NavLink to={`/w/${workspaceId}/scenarios`} className={navLinkClass}>
                  Scenarios
                </NavLink>
                <NavLink to={`/w/${workspaceId}/sweeps`} className={navLinkClass}>
                  Sweeps
                </NavLink>
                <NavLink to={`/w/${workspaceId}/lessons`} className={navLinkClass}>
                  Lessons
                </NavLink>
                <NavLink to={`/w/${workspaceId}/members`} className={navLinkClass}>
                  Members
                </NavLink>
              </nav>
            ) : null}
            <div className="ml-auto">
              <UnitsSwitch />
            </div>
          </div>
          <div className="ml-auto flex items-center gap-1 lg:ml-0">
            <NotificationsMenu />
            <NavLink
              to="/account"
              className={({ isActive }) =>
                `flex min-h-9 max-w-[12rem] items-center gap-2 rounded-seed px-2 py-1 text-sm font-medium hover:bg-silt-200/70 ${isActive ? 'bg-silt-200' : ''}`
              }
            >
              <span
                className="flex size-7 shrink-0 items-center justify-center rounded-full bg-loam-600 font-display text-sm font-semibold text-silt-50"
                aria-hidden="true"
              >
                {user.name.trim().charAt(0).toUpperCase()}
              </span>
              {/* On a phone the initial alone stands for the account; the name is still read out. */}
              <span className="sr-only truncate sm:not-sr-only">{user.name}</span>
              <span className="sr-only">, your account</span>
            </NavLink>
            <SignOutButton />
          </div>
        </div>
        <HorizonRule />
      </header>
      <main
        id="main"
        tabIndex={-1}
        className="mx-auto w-full max-w-page flex-1 px-4 py-8 focus:outline-none sm:px-6 sm:py-10"
      >
        <Outlet />
      </main>
    </div>
  );
}
