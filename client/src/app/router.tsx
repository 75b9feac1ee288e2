import { createBrowserRouter } from 'react-router-dom';
import { RequireAuth } from '../features/auth/RequireAuth';
import { WorkspaceScope } from '../features/workspaces/WorkspaceScope';
import { AppShell } from './AppShell';
import { HomeRedirect } from './HomeRedirect';
import { NotFoundPage } from './NotFoundPage';
import { BootScreen, RootLayout } from './RootLayout';
import { RouteError } from './RouteError';

/*
 * Pages load lazily, each in its own chunk, so the first screen (usually sign-in) only
 * downloads what it shows. The shell and guards are small and needed on every signed-in
 * page, so they stay in the main chunk.
 */
export const router = createBrowserRouter([
  {
    id: 'root',
    Component: RootLayout,
    ErrorBoundary: RouteError,
    HydrateFallback: BootScreen,
    children: [
      {
        path: 'sign-in',
        lazy: async () => ({ Component: (await import('../features/auth/SignInPage')).SignInPage }),
      },
      {
        path: 'sign-up',
        lazy: async () => ({ Component: (await import('../features/auth/SignUpPage')).SignUpPage }),
      },
      {
        Component: RequireAuth,
        children: [
          {
            Component: AppShell,
            children: [
              {
                // Errors below here render inside the shell, so the header stays usable.
                ErrorBoundary: RouteError,
                children: [
                  { index: true, Component: HomeRedirect },
                  {
                    path: 'w/:workspaceId',
                    Component: WorkspaceScope,
                    children: [
                      {
                        index: true,
                        lazy: async () => ({
                          Component: (await import('../features/dashboard/DashboardPage')).DashboardPage,
                        }),
                      },
                      {
                        path: 'members',
                        lazy: async () => ({
                          Component: (await import('../features/workspaces/MembersPage')).MembersPage,
                        }),
                      },
                    ],
                  },
                  {
                    path: 'account',
                    lazy: async () => ({
                      Component: (await import('../features/account/AccountPage')).AccountPage,
                    }),
                  },
                ],
              },
            ],
          },
        ],
      },
      { path: '*', Component: NotFoundPage },
    ],
  },
]);
