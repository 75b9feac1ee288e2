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
        path: 'forgot-password',
        lazy: async () => ({
          Component: (await import('../features/auth/ForgotPasswordPage')).ForgotPasswordPage,
        }),
      },
      {
        path: 'reset-password/:token',
        lazy: async () => ({
          Component: (await import('../features/auth/ResetPasswordPage')).ResetPasswordPage,
        }),
      },
      {
        path: 'invitations/:token',
        lazy: async () => ({ Component: (await import('./InvitationRoute')).InvitationRoute }),
      },
      {
        path: 'dev/outbox',
        lazy: async () => ({ Component: (await import('../features/outbox/OutboxPage')).OutboxPage }),
      },
      {
        // A class link: one lesson, signed out.
        path: 'class/:token',
        lazy: async () => ({
          Component: (await import('../features/lessons/ClassLessonPage')).ClassLessonPage,
        }),
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
                        lazy: async () => ({ Component: (await import('./DashboardRoute')).DashboardRoute }),
                      },
                      {
                        path: 'scenarios',
                        lazy: async () => ({
                          Component: (await import('../features/projections/ScenariosPage')).ScenariosPage,
                        }),
                      },
                      {
                        path: 'scenarios/new',
                        lazy: async () => ({
                          Component: (await import('../features/projections/ScenarioPage')).ScenarioPage,
                        }),
                      },
                      {
                        path: 'scenarios/:scenarioId',
                        lazy: async () => ({
                          Component: (await import('../features/projections/ScenarioPage')).ScenarioPage,
                        }),
                      },
                      {
                        path: 'projections/:projectionId',
                        lazy: async () => ({
                          Component: (await import('../features/projections/ProjectionPage')).ProjectionPage,
                        }),
                      },
                      {
                        path: 'batches/:batchId',
                        lazy: async () => ({
                          Component: (await import('../features/projections/ComparisonPage')).ComparisonPage,
                        }),
                      },
                      {
                        path: 'batches/:batchId/let-it-seed',
                        lazy: async () => ({
                          Component: (await import('../features/projections/LetItSeedPage')).LetItSeedPage,
                        }),
                      },
                      {
                        path: 'fields',
                        lazy: async () => ({
                          Component: (await import('../features/fields/FieldsPage')).FieldsPage,
                        }),
                      },
                      {
                        path: 'fields/new',
                        lazy: async () => ({
                          Component: (await import('../features/fields/FieldPages')).NewFieldPage,
                        }),
                      },
                      {
                        path: 'fields/:fieldId',
                        lazy: async () => ({
                          Component: (await import('../features/fields/FieldPages')).FieldPage,
                        }),
                      },
                      {
                        path: 'fields/:fieldId/records',
                        lazy: async () => ({ Component: (await import('./RecordsRoute')).RecordsRoute }),
                      },
                      {
                        path: 'profiles',
                        lazy: async () => ({
                          Component: (await import('../features/profiles/ProfilesPage')).ProfilesPage,
                        }),
                      },
                      {
                        path: 'profiles/new',
                        lazy: async () => ({
                          Component: (await import('../features/profiles/ProfilePages')).NewProfilePage,
                        }),
                      },
                      {
                        path: 'profiles/:profileId',
                        lazy: async () => ({ Component: (await import('./ProfileRoute')).ProfileRoute }),
                      },
                      {
                        path: 'strategies',
                        lazy: async () => ({ Component: (await import('./StrategyRoutes')).StrategiesRoute }),
                      },
                      {
                        path: 'strategies/new',
                        lazy: async () => ({
                          Component: (await import('./StrategyRoutes')).NewStrategyRoute,
                        }),
                      },
                      {
                        path: 'strategies/:strategyId',
                        lazy: async () => ({ Component: (await import('./StrategyRoutes')).StrategyRoute }),
                      },
                      {
                        path: 'lessons',
                        lazy: async () => ({
                          Component: (await import('../features/lessons/LessonsPage')).LessonsPage,
                        }),
                      },
                      {
                        path: 'lessons/new',
                        lazy: async () => ({ Component: (await import('./LessonRoutes')).NewLessonRoute }),
                      },
                      {
                        path: 'lessons/:lessonId',
                        lazy: async () => ({
                          Component: (await import('../features/lessons/LessonPages')).LessonPage,
                        }),
                      },
                      {
                        path: 'lessons/:lessonId/edit',
                        lazy: async () => ({ Component: (await import('./LessonRoutes')).EditLessonRoute }),
                      },
                      {
                        path: 'members',
                        lazy: async () => ({
                          Component: (await import('../features/workspaces/MembersPage')).MembersPage,
                        }),
                      },
                      {
                        path: 'sweeps',
                        lazy: async () => ({
                          Component: (await import('../features/sweeps/SweepsPage')).SweepsPage,
                        }),
                      },
                      {
                        path: 'sweeps/new',
                        lazy: async () => ({
                          Component: (await import('../features/sweeps/NewSweepPage')).NewSweepPage,
                        }),
                      },
                      {
                        path: 'sweeps/:sweepId',
                        lazy: async () => ({
                          Component: (await import('../features/sweeps/SweepPage')).SweepPage,
                        }),
                      },
                    ],
                  },
                  {
                    path: 'account',
                    lazy: async () => ({ Component: (await import('./AccountRoute')).AccountRoute }),
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
