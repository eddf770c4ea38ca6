// Mounting the scenario page for an engineer or a viewer with the API stubbed at fetch.
import { screen } from '@testing-library/react';
import { apiRoutes } from '../../../shared/api/routes';
import type { Role } from '../../../shared/api/roles';
import { mockApi, type MockAnswer, type RecordedCall } from '../support/fetch-mock';
import { me, project, revision, scenarioDetail, scenarioSummary, session } from '../support/fixtures';
import { renderApp } from '../support/render-app';
import { EMPTY_RUNS_PAGE } from '../runs/support/runs-fixtures';

export const SCENARIO_ID = scenarioSummary().id;

type Route = MockAnswer | ((call: RecordedCall) => MockAnswer | Promise<MockAnswer>);

export async function openScenarioPage(role: Role, extra: Record<string, Route> = {}) {
  const api = mockApi({
    [`GET ${apiRoutes.session}`]: session(me(role)),
    [`GET ${apiRoutes.scenario(SCENARIO_ID)}`]: { status: 200, body: scenarioDetail() },
    [`GET ${apiRoutes.project(project().id)}`]: { status: 200, body: project() },
    [`GET ${apiRoutes.scenarioRevisions(SCENARIO_ID)}`]: { status: 200, body: [revision(1), revision(2)] },
    [`GET ${apiRoutes.scenarioRuns(SCENARIO_ID)}`]: { status: 200, body: EMPTY_RUNS_PAGE },
    ...extra,
  });
  const app = renderApp(`/scenarios/${SCENARIO_ID}`);
  await screen.findByRole('heading', { level: 1, name: scenarioSummary().name });
  await screen.findByRole('navigation', { name: 'Scenario sections' });
  return { ...app, api };
}

/** The text of the error shown beside a field, found through the field's aria-describedby. */
export function errorBeside(control: HTMLElement): string {
  const ids = control.getAttribute('aria-describedby')?.split(/\s+/) ?? [];
  return ids.map((id) => document.getElementById(id)?.textContent ?? '').join(' ');
}
