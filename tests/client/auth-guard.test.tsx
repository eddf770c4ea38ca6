// Opening a signed-in page straight from its address (a reload, a bookmark) with nothing cached.
// The query cache tells each of its observers about the signed-in user in a later turn; the page's
// code can arrive in between, so the guard must not show the page before the session exists.
import { notifyManager } from '@tanstack/react-query';
import { screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { authKeys } from '../../src/lib/query-keys/auth';
import { mockApi } from './support/fetch-mock';
import { me, project, session } from './support/fixtures';
import { renderApp } from './support/render-app';

vi.setConfig({ testTimeout: 20_000 });

const pageCode = vi.hoisted(() => {
  let open: () => void = () => undefined;
  const arrived = new Promise<void>((resolve) => {
    open = resolve;
  });
  return { arrived, open: () => open() };
});

// The project page's code arrives only when the test says so, like a slow chunk on a cold start.
vi.mock('../../src/app/routes/project-route', async (importOriginal) => {
  await pageCode.arrived;
  return importOriginal();
});

afterEach(() => notifyManager.setScheduler((callback) => setTimeout(callback, 0)));

describe('a signed-in page opened directly', () => {
  it('waits for the session and then shows the page, never the error view', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me('engineer')),
      [`GET ${apiRoutes.project(project().id)}`]: { status: 200, body: project() },
      [`GET ${apiRoutes.projectScenarios(project().id)}`]: { status: 200, body: [] },
    });
    const held: (() => void)[] = [];
    notifyManager.setScheduler((callback) => held.push(callback));
    const { router, queryClient } = renderApp(`/projects/${project().id}`);

    // The user is in the cache, but no component has been told yet.
    await waitFor(() => expect(queryClient.getQueryData(authKeys.me())).toBeTruthy());
    pageCode.open();
    await waitFor(() => expect(router.state.initialized).toBe(true));
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(screen.queryByText('This page could not be shown.')).toBeNull();

    notifyManager.setScheduler((callback) => setTimeout(callback, 0));
    held.splice(0).forEach((callback) => callback());
    expect(await screen.findByRole('heading', { level: 1, name: project().name })).toBeTruthy();
    expect(screen.queryByText('This page could not be shown.')).toBeNull();
  });
});
