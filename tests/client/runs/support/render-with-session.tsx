// Mounts one component behind the real sign-in guard and providers, with a stand-in result page
// so navigation after a save is visible, and the in-process simulation port.
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider, useParams } from 'react-router-dom';
import { AppProvider, createAppQueryClient } from '../../../../src/app/provider';
import { RequireAuth } from '../../../../src/features/auth/components/require-auth';
import { SimulationPortContext } from '../../../../src/features/runs/simulation/simulation-context';
import type { OpenSimulationPort } from '../../../../src/features/runs/simulation/simulation-port';

function ResultStandIn() {
  const { runId } = useParams();
  return <h1>Result of run {runId}</h1>;
}

export function renderWithSession(ui: ReactNode, openPort: OpenSimulationPort) {
  const router = createMemoryRouter(
    [
      {
        element: <RequireAuth />,
        children: [
          { path: '/under-test', element: ui },
          { path: '/runs/:runId', element: <ResultStandIn /> },
        ],
      },
    ],
    { initialEntries: ['/under-test'] },
  );
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={createAppQueryClient()}>
      <SimulationPortContext.Provider value={openPort}>
        <RouterProvider router={router} />
      </SimulationPortContext.Provider>
    </AppProvider>,
  );
  return { router, user, path: () => router.state.location.pathname };
}
