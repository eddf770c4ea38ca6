// Every page of the client and the guard in front of the signed-in ones. The
// route objects are exported so tests can mount them in a memory router.
// Pages that carry the scenario format (and later the editor, the worker and
// the charts) load on demand, so signing in does not wait for them.
import type { RouteObject } from 'react-router-dom';
import { PageSpinner } from '../components/ui/spinner';
import { RequireAuth } from '../features/auth/components/require-auth';
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
    lazy: async () => ({ Component: (await import('../features/scenarios/routes/scenario-route')).ScenarioRoute }),
  },
  {
    path: '/scenarios/:scenarioId/revisions/:number',
    lazy: async () => ({ Component: (await import('../features/editor/routes/revision-route')).RevisionRoute }),
  },
  {
    path: '/projects/:projectId/runs',
    lazy: async () => ({ Component: (await import('../features/runs/routes/project-runs-route')).ProjectRunsRoute }),
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
    path: '/runs/:runId/playback',
    lazy: async () => ({ Component: (await import('./routes/playback-route')).PlaybackRoute }),
  },
  {
    path: '/runs/:runId',
    lazy: async () => ({ Component: (await import('../features/results/routes/run-route')).RunRoute }),
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
        children: [...publicPages, { element: <RequireAuth />, children: signedInPages }, { path: '*', element: <NotFoundRoute /> }],
      },
    ],
  },
];
