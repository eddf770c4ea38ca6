import { readdirSync } from 'node:fs';
import { screen, within } from '@testing-library/react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import type { CreateScenarioInput } from '../../shared/api/scenarios';
import stackedLoop from '../../shared/examples/stacked-loop.json';
import { apiError, mockApi } from './support/fetch-mock';
import { me, project, revision, scenarioDetail, scenarioSummary, session } from './support/fixtures';
import { renderApp } from './support/render-app';
import { EMPTY_RUNS_PAGE } from './runs/support/runs-fixtures';

// The scenario page mounts the whole editor and drawing; on a busy machine that takes longer than 5 s.
vi.setConfig({ testTimeout: 20_000 });

// The pages load on demand; importing them once up front keeps that first import out of the tests' waits.
beforeAll(async () => {
  await Promise.all([import('../../src/app/routes/scenario-route'), import('../../src/app/routes/project-route')]);
}, 60_000);

const projectRoutes = (role: 'engineer' | 'viewer', scenarios = [scenarioSummary()]) => ({
  [`GET ${apiRoutes.session}`]: session(me(role)),
  [`GET ${apiRoutes.project(project().id)}`]: { status: 200, body: project({ scenarioCount: scenarios.length }) },
  [`GET ${apiRoutes.projectScenarios(project().id)}`]: { status: 200, body: scenarios },
});

describe('project page', () => {
  it('lists the scenarios with their latest revision', async () => {
    mockApi(projectRoutes('viewer'));
    renderApp(`/projects/${project().id}`);

    const link = await screen.findByRole('link', { name: /Stacked, 20 carriers/ });
    expect(link.getAttribute('href')).toBe(`/scenarios/${scenarioSummary().id}`);
    expect(link.textContent).toContain('Revision 2');
    expect(screen.queryByRole('button', { name: 'New scenario' })).toBeNull();
  });

  it('points an engineer of an empty project to the examples and creates a scenario from one', async () => {
    const created = scenarioSummary({ id: scenarioSummary().id, name: 'Stacked first try' });
    const api = mockApi({
      ...projectRoutes('engineer', []),
      [`POST ${apiRoutes.projectScenarios(project().id)}`]: { status: 201, body: created },
      [`GET ${apiRoutes.scenario(created.id)}`]: { status: 200, body: scenarioDetail({ name: 'Stacked first try' }) },
      [`GET ${apiRoutes.scenarioRevisions(created.id)}`]: { status: 200, body: [revision(1)] },
    });
    const { user, location } = renderApp(`/projects/${project().id}`);

    const empty = (await screen.findByRole('heading', { name: 'No scenarios yet' })).parentElement as HTMLElement;
    expect(empty.textContent).toContain('Start from an example layout');
    await user.click(within(empty).getByRole('button', { name: 'New scenario' }));
    await user.selectOptions(screen.getByLabelText('Start from'), stackedLoop.name);
    expect(screen.getByLabelText<HTMLInputElement>('Scenario name').value).toBe(stackedLoop.name);
    await user.clear(screen.getByLabelText('Scenario name'));
    await user.type(screen.getByLabelText('Scenario name'), 'Stacked first try');
    await user.click(screen.getByRole('button', { name: 'Create scenario' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Stacked first try' })).toBeTruthy();
    expect(location()).toBe(`/scenarios/${created.id}`);
    const sent = api.callsTo('POST', apiRoutes.projectScenarios(project().id))[0].body as CreateScenarioInput;
    expect(sent.name).toBe('Stacked first try');
    expect(sent.document.name).toBe('Stacked first try');
    expect(sent.document.lanes.map((lane) => lane.id)).toEqual(stackedLoop.lanes.map((lane) => lane.id));
  });

  it('offers every bundled example layout as a starting point', async () => {
    mockApi(projectRoutes('engineer', []));
    const { user } = renderApp(`/projects/${project().id}`);

    await user.click(await screen.findByRole('button', { name: 'New scenario' }));
    const group = screen.getByRole('group', { name: 'Example layouts' });
    const exampleFiles = readdirSync('shared/examples').filter((name) => name.endsWith('.json'));
    expect(within(group).getAllByRole('option')).toHaveLength(exampleFiles.length);
    await user.selectOptions(screen.getByLabelText('Start from'), stackedLoop.name);
    expect(document.querySelector('[data-source-note]')?.textContent).toContain('Stacked loop with elevators');
  });

  it('lists server issues inside the document in the banner and keeps the form filled', async () => {
    mockApi({
      ...projectRoutes('engineer', []),
      [`POST ${apiRoutes.projectScenarios(project().id)}`]: {
        status: 400,
        body: apiError('bad_request', 'The scenario document is not valid.', [
          { path: 'document.carriers.count', message: 'count must be from 1 to 2000' },
        ]),
      },
    });
    const { user } = renderApp(`/projects/${project().id}`);

    await user.click(await screen.findByRole('button', { name: 'New scenario' }));
    await user.selectOptions(screen.getByLabelText('Start from'), stackedLoop.name);
    await user.click(screen.getByRole('button', { name: 'Create scenario' }));

    const banner = await screen.findByRole('alert');
    expect(banner.textContent).toContain('The scenario document is not valid.');
    expect(banner.textContent).toContain('document.carriers.count: count must be from 1 to 2000');
    expect(screen.getByLabelText<HTMLInputElement>('Scenario name').value).toBe(stackedLoop.name);
  });
});

describe('scenario page', () => {
  it('says plainly when the scenario does not exist', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me()),
      [`GET ${apiRoutes.scenarioRevisions(scenarioSummary().id)}`]: {
        status: 404,
        body: apiError('not_found', 'No such scenario.'),
      },
    });
    renderApp(`/scenarios/${scenarioSummary().id}`);

    expect(await screen.findByRole('heading', { name: 'This scenario was not found' })).toBeTruthy();
  });

  it('shows a viewer the latest revision read-only: drawing, balance and history, but no edit, save, restore, import or run controls', async () => {
    mockApi({
      [`GET ${apiRoutes.session}`]: session(me('viewer')),
      [`GET ${apiRoutes.scenario(scenarioSummary().id)}`]: { status: 200, body: scenarioDetail() },
      [`GET ${apiRoutes.project(project().id)}`]: { status: 200, body: project() },
      [`GET ${apiRoutes.scenarioRevisions(scenarioSummary().id)}`]: { status: 200, body: [revision(1), revision(2)] },
      [`GET ${apiRoutes.scenarioRuns(scenarioSummary().id)}`]: { status: 200, body: EMPTY_RUNS_PAGE },
    });
    renderApp(`/scenarios/${scenarioSummary().id}`);

    expect(await screen.findByRole('heading', { level: 1, name: 'Stacked, 20 carriers' })).toBeTruthy();
    expect(await screen.findByRole('link', { name: 'Cartridge line 2' })).toBeTruthy();
    // Each lane of the example is eight 1000 mm modules.
    expect(document.querySelector('[data-fact="track-length"]')?.textContent).toBe('16 m');
    expect(document.querySelectorAll('[data-lane-id]')).toHaveLength(stackedLoop.lanes.length);
    expect(screen.getByLabelText<HTMLInputElement>('Scenario name').disabled).toBe(true);

    const history = await screen.findByRole('table', { name: 'Revision history' });
    const rows = within(history).getAllByRole('row').slice(1);
    expect(rows.map((row) => row.textContent)).toEqual([
      expect.stringMatching(/^#2latestChange 2Ada Fieldhouse/),
      expect.stringMatching(/^#1Started from/),
    ]);
    expect(within(history).getByRole('link', { name: 'Open revision 1' }).getAttribute('href')).toBe(
      `/scenarios/${scenarioSummary().id}/revisions/1`,
    );

    expect(screen.queryByRole('button', { name: /Save as revision/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /Restore/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /Import/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Run/ })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Add lane' })).toBeNull();
  });
});
