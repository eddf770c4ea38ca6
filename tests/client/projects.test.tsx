import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { descriptionOf } from './support/field-error';
import { apiError, mockApi } from './support/fetch-mock';
import { me, ORG_ID, project, session } from './support/fixtures';
import { renderApp } from './support/render-app';

describe('project list', () => {
  it('tells an engineer with no projects to create one, and offers the button', async () => {
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(me('engineer')),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [] },
    });
    renderApp('/');

    const empty = (await screen.findByRole('heading', { name: 'No projects yet' })).parentElement as HTMLElement;
    expect(empty.textContent).toContain('Create one');
    expect(within(empty).getByRole('button', { name: 'New project' })).toBeTruthy();
    expect(api.callsTo('GET', apiRoutes.projects)[0].search).toBe(`?organisationId=${ORG_ID}`);
  });

  it('shows a viewer no create control, only who can create', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me('viewer')),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [] },
    });
    renderApp('/');

    const empty = (await screen.findByRole('heading', { name: 'No projects yet' })).parentElement as HTMLElement;
    expect(empty.textContent).toContain('Engineers and owners');
    expect(screen.queryByRole('button', { name: 'New project' })).toBeNull();
    expect(screen.getByText('viewer')).toBeTruthy();
  });

  it('lists projects with their scenario counts', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me('viewer')),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [project({ scenarioCount: 2 })] },
    });
    renderApp('/');

    const link = await screen.findByRole('link', { name: /Cartridge line 2/ });
    expect(link.getAttribute('href')).toBe(`/projects/${project().id}`);
    expect(link.textContent).toContain('2 scenarios');
  });

  it('shows the server field error beside the project name and keeps the description', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me('owner')),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [] },
      [`POST ${apiRoutes.projects}`]: {
        status: 409,
        body: apiError('conflict', 'A project with this name exists.', [
          { path: 'name', message: 'is already used by another project' },
        ]),
      },
    });
    const { user } = renderApp('/');

    await user.click(await screen.findByRole('button', { name: 'New project' }));
    await user.type(screen.getByLabelText('Project name'), 'Cartridge line 2');
    await user.type(screen.getByLabelText('Description (optional)'), 'Hall B');
    await user.click(screen.getByRole('button', { name: 'Create project' }));

    await waitFor(() =>
      expect(descriptionOf(screen.getByLabelText('Project name'))).toContain(
        'Project name is already used by another project',
      ),
    );
    expect(screen.getByLabelText<HTMLTextAreaElement>('Description (optional)').value).toBe('Hall B');
  });

  it('opens the new project after creating it', async () => {
    const created = project({ name: 'Sensor module line' });
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(me('engineer')),
      [`GET ${apiRoutes.projects}`]: { status: 200, body: [] },
      [`POST ${apiRoutes.projects}`]: { status: 201, body: created },
      [`GET ${apiRoutes.projectScenarios(created.id)}`]: { status: 200, body: [] },
    });
    const { user, location } = renderApp('/');

    await user.click(await screen.findByRole('button', { name: 'New project' }));
    await user.type(screen.getByLabelText('Project name'), '  Sensor module line ');
    await user.click(screen.getByRole('button', { name: 'Create project' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sensor module line' })).toBeTruthy();
    expect(location()).toBe(`/projects/${created.id}`);
    expect(api.callsTo('POST', apiRoutes.projects)[0].body).toEqual({
      name: 'Sensor module line',
      description: '',
      organisationId: ORG_ID,
    });
    expect(await screen.findByRole('heading', { name: 'No scenarios yet' })).toBeTruthy();
  });
});
