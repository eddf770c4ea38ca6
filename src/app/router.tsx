// Every page of the client and the guard in front of the signed-in ones. The
// route objects are exported so tests can mount them in a memory router.
// Pages that carry the scenario format (and later the editor, the worker and
// the charts) load on demand, so signing in does not wait for them.
import type { RouteObject } from 'react-router-dom';
import { PageSpinner } from '../components/ui/spinner';
import { RequireAuth } from '../features/auth/components/require-auth';
import { FinishSignUpRoute } from '../features/auth/routes/finish-sign-up-route';
import { ForgotPasswordRoute } from '../features/auth/routes/forgot-password-route';
import { ResetPasswordRoute } from '../features/auth/routes/reset-password-route';
import { SignInRoute } from '../features/auth/routes/sign-in-route';
import { SignUpRoute } from '../features/auth/routes/sign-up-route';
import { ProjectsRoute } from '../features/projects/routes/projects-route';
import { AppFrame } from './layout/app-frame';
import { NotFoundRoute } from './routes/not-found-route';
import { RouteError } from './routes/route-error';

/** Pages anyone may open. */
const publicPages: RouteObject[] = [
  { path: '/sign-in', element: <SignInRoute /> },
  { path: '/sign-up', element: <SignUpRoute /> },
  { path: '/sign-up/finish', element: <FinishSignUpRoute /> },
  { path: '/forgot-password', element: <ForgotPasswordRoute /> },
  { path: '/reset-password', element: <ResetPasswordRoute /> },
  {
    path: '/invitations/accept',
    lazy: async () => ({ Component: (await import('./routes/accept-invitation-route')).AcceptInvitationRoute }),
  },
  { path: '/shared', lazy: async () => ({ Component: (await import('./routes/shared-route')).SharedRoute }) },
  {
    path: '/dev/mailbox',
    lazy: async () => ({ Component: (await import('../features/mailbox/routes/mailbox-route')).MailboxRoute }),
  },
];

/** Pages behind sign-in; RequireAuth sends visitors to sign-in and back. */
const signedInPages: RouteObject[] = [
  { path: '/', element: <ProjectsRoute /> },
  {
    path: '/projects/:projectId',
    lazy: async () => ({ Component: (await import('./routes/project-route')).ProjectRoute }),
  },
  {
    path: '/scenarios/:scenarioId',
    lazy: async () => ({ Component: (await import('./routes/scenario-route')).ScenarioRoute }),
  },
  {
    path: '/scenarios/:scenarioId/revisions/:number',
    lazy: async () => ({ Component: (await import('./routes/revision-route')).RevisionRoute }),
  },
  {
    path: '/projects/:projectId/runs',
    lazy: async () => ({ Component: (await import('./routes/project-runs-route')).ProjectRunsRoute }),
  },
  {
    path: '/projects/:projectId/studies',
    lazy: async () => ({ Component: (await import('./routes/project-studies-route')).ProjectStudiesRoute }),
  },
  {
    path: '/studies/:studyId',
    lazy: async () => ({ Component: (await import('./routes/study-route')).StudyRoute }),
  },
  {
    path: '/projects/:projectId/compare',
    lazy: async () => ({ Component: (await import('./routes/compare/compare-route')).CompareRoute }),
  },
  {
    path: '/projects/:projectId/compare/report',
    lazy: async () => ({ Component: (await import('./routes/compare/compare-report-route')).CompareReportRoute }),
  },
  {
    path: '/projects/:projectId/compare/studies',
    lazy: async () => ({ Component: (await import('./routes/compare/compare-studies-route')).CompareStudiesRoute }),
  },
  {
    path: '/projects/:projectId/compare/studies/report',
    lazy: async () => ({
      Component: (await import('./routes/compare/compare-studies-report-route')).CompareStudiesReportRoute,
    }),
  },
  {
    path: '/runs/:runId/playback',
    lazy: async () => ({ Component: (await import('./routes/playback-route')).PlaybackRoute }),
  },
  {
    path: '/runs/:runId',
    lazy: async () => ({ Component: (await import('./routes/run-page-route')).RunPageRoute }),
  },
  {
    path: '/account',
    lazy: async () => ({ Component: (await import('../features/auth/routes/account-route')).AccountRoute }),
  },
  {
    path: '/organisations/:organisationId/members',
    lazy: async () => ({ Component: (await import('./routes/members-route')).MembersRoute }),
  },
  {
    path: '/organisations/:organisationId/audit',
    lazy: async () => ({ Component: (await import('./routes/audit-route')).AuditRoute }),
  },
];

export const appRoutes: RouteObject[] = [
  {
    element: <AppFrame />,
    hydrateFallbackElement: <PageSpinner label="Loading Lanewright…" />,
    children: [
      {
        // A page that throws is replaced inside the frame, keeping header and safety note.
        errorElement: <RouteError />,
        children: [
          ...publicPages,
          { element: <RequireAuth />, children: signedInPages },
          { path: '*', element: <NotFoundRoute /> },
        ],
      },
    ],
  },
];
