import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { OpenSimulationPort } from '../../../src/features/runs/simulation/simulation-port';
import { apiRoutes } from '../../../shared/api/routes';
import type { CreateRunInput } from '../../../shared/api/runs';
import stackedLoop from '../../../shared/examples/stacked-loop.json';
import { scenarioSchema } from '../../../shared/scenario/scenario';
import { RunPanel } from '../../../src/features/runs/components/run-panel';
import { apiError, mockApi } from '../support/fetch-mock';
import { descriptionOf } from '../support/field-error';
import { me, ORG_ID, revision, scenarioSummary, session } from '../support/fixtures';
import { inProcessPorts } from './support/in-process-port';
import { renderWithSession } from './support/render-with-session';
import { runItem } from './support/runs-fixtures';

const document = scenarioSchema.parse(stackedLoop);
const latest = revision(2);

function panel() {
  return (
    <>
      <p>Scenario page</p>
      <RunPanel
        scenarioId={scenarioSummary().id}
        organisationId={ORG_ID}
        revision={{ id: latest.id, number: latest.number, document }}
      />
    </>
  );
}

async function setField(user: ReturnType<typeof renderWithSession>['user'], label: string, value: string) {
  const input = screen.getByLabelText(label);
  await user.clear(input);
  if (value) await user.type(input, value);
}

describe('run panel', () => {
  it('says what is wrong with each setting, beside the field, and starts nothing', async () => {
    mockApi({ [`GET ${apiRoutes.session}`]: session(me('engineer')) });
    const ports = inProcessPorts();
    const { user } = renderWithSession(panel(), ports.open);

    await screen.findByRole('button', { name: 'Run simulation' });
    await setField(user, 'Hours simulated', '0');
    await setField(user, 'Replications', '2.5');
    await setField(user, 'Warm-up (minutes)', '-5');
    await user.click(screen.getByRole('button', { name: 'Run simulation' }));

    await waitFor(() =>
      expect(descriptionOf(screen.getByLabelText('Hours simulated'))).toContain(
        'Hours simulated must be from 0.01 to 8760',
      ),
    );
    expect(descriptionOf(screen.getByLabelText('Replications'))).toContain('Replications must be a whole number');
    expect(descriptionOf(screen.getByLabelText('Warm-up (minutes)'))).toContain(
      'Warm-up (minutes) must be from 0 to 525600',
    );
    expect(ports.runs).toHaveLength(0);
  });

  it('places the engine’s objection to the carrier count beside the carrier field', async () => {
    mockApi({ [`GET ${apiRoutes.session}`]: session(me('engineer')) });
    const ports = inProcessPorts();
    const { user } = renderWithSession(panel(), ports.open);

    await screen.findByRole('button', { name: 'Run simulation' });
    await setField(user, 'Carrier count', '500');
    await user.click(screen.getByRole('button', { name: 'Run simulation' }));

    await waitFor(() =>
      expect(descriptionOf(screen.getByLabelText('Carrier count'))).toMatch(
        /500 carriers do not fit: the track holds \d+/,
      ),
    );
    expect(ports.runs).toHaveLength(1);
  });

  it('retries a failed save with the same client run id, so the run is stored once, then opens it', async () => {
    const saved = runItem(1);
    let attempts = 0;
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(me('engineer')),
      [`POST ${apiRoutes.scenarioRuns(scenarioSummary().id)}`]: () =>
        ++attempts === 1
          ? { status: 503, body: apiError('internal', 'The database is restarting.') }
          : { status: 201, body: saved },
    });
    const ports = inProcessPorts();
    const { user, path } = renderWithSession(panel(), ports.open);

    await screen.findByRole('button', { name: 'Run simulation' });
    await setField(user, 'Hours simulated', '0.05');
    await setField(user, 'Warm-up (minutes)', '1');
    await setField(user, 'Replications', '2');
    await setField(user, 'Seed', '42');
    await user.click(screen.getByRole('button', { name: 'Run simulation' }));

    const banner = await screen.findByRole('alert', {}, { timeout: 15_000 });
    expect(banner.textContent).toContain('The run finished but is not saved yet');
    expect(banner.textContent).toContain('The database is restarting.');
    await user.click(screen.getByRole('button', { name: 'Save again' }));

    await screen.findByRole('heading', { name: `Result of run ${saved.id}` });
    expect(path()).toBe(`/runs/${saved.id}`);
    const posts = api
      .callsTo('POST', apiRoutes.scenarioRuns(scenarioSummary().id))
      .map((call) => call.body as CreateRunInput);
    expect(posts).toHaveLength(2);
    expect(posts[0].clientRunId).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(posts[1].clientRunId).toBe(posts[0].clientRunId);
    expect(posts[1]).toEqual(posts[0]);
    expect(posts[0].revisionId).toBe(latest.id);
    expect(posts[0].settings).toEqual({ hours: 0.05, warmupMinutes: 1, replications: 2, seed: 42 });
    expect(posts[0].name).toBe('Revision 2: 2 × 0.05 h, seed 42');
    expect(posts[0].results.replications).toHaveLength(2);
    expect(ports.runs).toHaveLength(1);
  }, 30_000);

  it('shows a viewer no run controls at all', async () => {
    mockApi({ [`GET ${apiRoutes.session}`]: session(me('viewer')) });
    renderWithSession(panel(), inProcessPorts().open);

    await screen.findByText('Scenario page');
    expect(screen.queryByRole('button', { name: 'Run simulation' })).toBeNull();
    expect(screen.queryByRole('form', { name: 'Run settings' })).toBeNull();
    expect(screen.queryByText(/Run revision/)).toBeNull();
  });

  it('asks before leaving the page while a run is in progress, and stays when the answer is no', async () => {
    mockApi({ [`GET ${apiRoutes.session}`]: session(me('engineer')) });
    // A run that never finishes, so the page stays in the running state.
    const hanging: OpenSimulationPort = () => ({ run: () => new Promise(() => undefined), terminate: () => undefined });
    const { user, router, path } = renderWithSession(panel(), hanging);
    await user.click(await screen.findByRole('button', { name: 'Run simulation' }));
    await screen.findByRole('button', { name: 'Cancel run' });

    const unload = new Event('beforeunload', { cancelable: true });
    window.dispatchEvent(unload);
    expect(unload.defaultPrevented).toBe(true);

    // happy-dom has no dialogs: stand in for the user's "Cancel".
    const confirm = vi.fn(() => false);
    vi.stubGlobal('confirm', confirm);
    await router.navigate('/runs/elsewhere');
    await waitFor(() =>
      expect(confirm).toHaveBeenCalledWith(expect.stringMatching(/Leaving stops it and nothing is saved/)),
    );
    expect(path()).toBe('/under-test');
    vi.unstubAllGlobals();
  });
});
