// Every page of the client and the guard in front of the signed-in ones. The
// route objects are exported so tests can mount them in a memory router.
import type { RouteObject } from 'react-router-dom';
import { RequireAuth } from '../features/auth/components/require-auth';
import { SignInRoute } from '../features/auth/routes/sign-in-route';
import { SignUpRoute } from '../features/auth/routes/sign-up-route';
import { ProjectsRoute } from '../features/projects/routes/projects-route';
import { ScenarioRoute } from '../features/scenarios/routes/scenario-route';
import { AppFrame } from './layout/app-frame';
import { NotFoundRoute } from './routes/not-found-route';
import { ProjectRoute } from './routes/project-route';

export const appRoutes: RouteObject[] = [
  {
    element: <AppFrame />,
    children: [
      { path: '/sign-in', element: <SignInRoute /> },
      { path: '/sign-up', element: <SignUpRoute /> },
      {
        element: <RequireAuth />,
        children: [
          { path: '/', element: <ProjectsRoute /> },
          { path: '/projects/:projectId', element: <ProjectRoute /> },
          { path: '/scenarios/:scenarioId', element: <ScenarioRoute /> },
        ],
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
];
