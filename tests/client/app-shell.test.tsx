import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { mockApi } from './support/fetch-mock';
import { me, project, uuid, session } from './support/fixtures';
import { renderApp } from './support/render-app';

describe('app shell', () => {
  it('shows organisation, user and role, and the safety note', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me('owner')),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [] },
    });
    renderApp('/');

    const header = await screen.findByRole('banner');
    await waitFor(() => expect(header.textContent).toContain('Ada Fieldhouse'));
    expect(header.textContent).toContain('Northgate Fixtures');
    expect(screen.getByLabelText('Role: owner')).toBeTruthy();
    expect(screen.getByRole('contentinfo').textContent).toMatch(/does not assess safety/);
    expect(screen.getByRole('link', { name: 'Skip to main content' }).getAttribute('href')).toBe('#main');
  });

  it('signs out with a POST, forgets cached data and lands on sign-in without a return address', async () => {
    let signedIn = true;
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: () => session(signedIn ? me() : null),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [project()] },
      [`POST ${apiRoutes.signOut}`]: () => {
        signedIn = false;
        return { status: 204 };
      },
    });
    const { user, location, queryClient } = renderApp('/');

    await screen.findByRole('link', { name: /Cartridge line 2/ });
    await user.click(screen.getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in to Lanewright' })).toBeTruthy();
    expect(location()).toBe('/sign-in');
    expect(api.callsTo('POST', apiRoutes.signOut)).toHaveLength(1);
    expect(screen.queryByText('Ada Fieldhouse')).toBeNull();
    expect(queryClient.getQueryCache().findAll({ queryKey: ['projects'] })).toHaveLength(0);
  });

  it('answers an unknown address with a not-found page', async () => {
    mockApi({ [`GET ${apiRoutes.session}`]: session(me()) });
    renderApp('/no/such/page');

    expect(await screen.findByRole('heading', { name: 'This page was not found' })).toBeTruthy();
  });
});

describe('organisation switch', () => {
  it('shows the chosen organisation with the role held there, and remembers the choice', async () => {
    const secondOrg = uuid(3);
    const twoOrgs = {
      ...me('viewer'),
      memberships: [
        ...me('viewer').memberships,
        { organisationId: secondOrg, organisationName: 'Harbour Sensors', role: 'engineer' as const },
      ],
    };
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(twoOrgs),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [] },
    });
    const { user } = renderApp('/');

    await screen.findByRole('heading', { name: 'No projects yet' });
    expect(screen.getByLabelText('Role: viewer')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'New project' })).toBeNull();

    await user.selectOptions(screen.getByLabelText('Organisation'), 'Harbour Sensors');

    expect(await screen.findByRole('button', { name: 'New project' })).toBeTruthy();
    expect(screen.getByLabelText('Role: engineer')).toBeTruthy();
    expect(api.calls.some((c) => c.path === apiRoutes.projects && c.search === `?organisationId=${secondOrg}`)).toBe(
      true,
    );
    expect(window.localStorage.getItem('lanewright.organisationId')).toBe(secondOrg);
  });
});
