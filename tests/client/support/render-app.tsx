// Mounts the real route table in a memory router with the app's own providers,
// so tests exercise the same guards, cache and 401 handling as the browser.
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProvider, createAppQueryClient } from '../../../src/app/provider';
import { appRoutes } from '../../../src/app/router';

export function renderApp(path: string) {
  const router = createMemoryRouter(appRoutes, { initialEntries: [path] });
  const queryClient = createAppQueryClient();
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  const location = () => `${router.state.location.pathname}${router.state.location.search}`;
  return { router, queryClient, user, location };
}
