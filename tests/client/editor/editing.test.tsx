import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { apiRoutes } from '../../../shared/api/routes';
import type { CreateRevisionInput } from '../../../shared/api/scenarios';
import stackedLoop from '../../../shared/examples/stacked-loop.json';
import { apiError } from '../support/fetch-mock';
import { scenarioDetail, revision } from '../support/fixtures';
import { errorBeside, openScenarioPage, SCENARIO_ID } from './workspace-fixtures';

vi.setConfig({ testTimeout: 30_000 });

beforeAll(async () => {
  await import('../../../src/app/routes/scenario-route');
}, 60_000);

// Drafts live in sessionStorage; each test starts without one.
afterEach(() => window.sessionStorage.clear());

const section = (name: string) =>
  within(screen.getByRole('navigation', { name: 'Scenario sections' })).getByRole('button', {
    name: new RegExp(`^${name}`),
  });

describe('scenario editor', () => {
  it("shows the schema's message beside a station's cycle time when it is made invalid", async () => {
    const { user } = await openScenarioPage('engineer');
    await user.click(section('Process and stations'));
    await user.click(screen.getByRole('button', { name: /^Step 2: Press seat ring/ }));
    await user.click(screen.getByRole('button', { name: 'Station PR' }));

    const value = within(
      document.querySelector('[data-distribution$="cycleTimeSeconds"]') as HTMLElement,
    ).getByLabelText('Value (s)');
    await user.clear(value);
    await user.type(value, '-3');
    // fixedSchema: nonNegative('value') → "value must be zero or more".
    await waitFor(() => expect(errorBeside(value)).toContain('Value must be zero or more'));
    expect(within(section('Process and stations')).getByLabelText('1 problem')).toBeTruthy();
  });

  it('reads "9,5" as nine and a half, refuses "1,500" with a reason and only cautions about a 0 s cycle time', async () => {
    const { user } = await openScenarioPage('engineer');
    await user.click(section('Process and stations'));
    await user.click(screen.getByRole('button', { name: /^Step 2: Press seat ring/ }));
    await user.click(screen.getByRole('button', { name: 'Station PR' }));
    const editor = document.querySelector('[data-distribution$="cycleTimeSeconds"]') as HTMLElement;
    const value = within(editor).getByLabelText('Value (s)');
    await user.clear(value);
    await user.type(value, '9,5');
    await waitFor(() => expect(errorBeside(value)).toBeFalsy());
    expect(editor.textContent).toMatch(/9\.5 s/);
    await user.clear(value);
    await user.type(value, '1,500');
    await waitFor(() => expect(errorBeside(value)).toMatch(/"1,500" is ambiguous/));
    await user.clear(value);
    await user.type(value, '0');
    await waitFor(() =>
      expect(editor.querySelector('[data-plausibility-caution]')?.textContent).toMatch(
        /mean cycle time of 0 s is unusual/,
      ),
    );
    await waitFor(() => expect(errorBeside(value)).toBeFalsy());
  });

  it('selects a station clicked in the drawing and opens it in the editor', async () => {
    const { user } = await openScenarioPage('engineer');
    await user.click(document.querySelector('[data-station-id="FT2"]') as Element);
    expect(screen.getByLabelText<HTMLInputElement>('Station id').value).toBe('FT2');
    expect(document.querySelector('[data-station-id="FT2"]')?.getAttribute('data-selected')).toBe('true');
  });

  it('keeps everything typed and puts the server’s field errors beside their fields when a save is refused', async () => {
    const { user, api } = await openScenarioPage('engineer', {
      [`POST ${apiRoutes.scenarioRevisions(SCENARIO_ID)}`]: {
        status: 400,
        body: apiError('bad_request', 'The scenario document is not valid.', [
          { path: 'document.carriers.count', message: 'count must be at most 40 for this track' },
          { path: 'document.steps[1].stations[0].cycleTimeSeconds.value', message: 'value must be at most 3600' },
        ]),
      },
    });
    await user.click(section('Carriers'));
    const count = within(screen.getByRole('region', { name: 'Carriers' })).getByLabelText<HTMLInputElement>(
      'Carrier count',
    );
    await user.clear(count);
    await user.type(count, '55');
    await user.type(screen.getByLabelText('What changed (optional)'), 'more carriers');
    const save = screen.getByRole('button', { name: 'Save as revision 3' });
    await waitFor(() => expect(save.hasAttribute('disabled')).toBe(false));
    await user.click(save);

    await waitFor(() => expect(errorBeside(count)).toContain('Carrier count must be at most 40 for this track'));
    expect(count.value).toBe('55');
    expect(screen.getByLabelText<HTMLInputElement>('What changed (optional)').value).toBe('more carriers');
    const sent = api.callsTo('POST', apiRoutes.scenarioRevisions(SCENARIO_ID))[0].body as CreateRevisionInput;
    expect(sent).toMatchObject({ baseRevisionNumber: 2, message: 'more carriers' });
    expect(sent.document.carriers.count).toBe(55);
    expect(screen.getByRole('alert').textContent).toContain('Carriers count: count must be at most 40 for this track');
    // Step 2's only station is "Press": the list names it, never the internal path.
    expect(screen.getByRole('alert').textContent).toContain(
      "Station 'Press', cycle time value: value must be at most 3600",
    );
    expect(screen.getByRole('alert').textContent).not.toContain('steps[1]');
    const alert = screen.getByRole('alert');
    const pressItem = within(alert)
      .getAllByRole('listitem')
      .find((li) => li.textContent?.startsWith("Station 'Press'")) as HTMLElement;
    await user.click(within(pressItem).getByRole('button', { name: 'Show the field' }));
    await waitFor(() =>
      expect(document.activeElement?.getAttribute('name')).toBe('steps.1.stations.0.cycleTimeSeconds.value'),
    );
  });

  it('on a conflict keeps the draft and puts it on top of the revision saved meanwhile', async () => {
    let latest = 2;
    const { user, api } = await openScenarioPage('engineer', {
      [`POST ${apiRoutes.scenarioRevisions(SCENARIO_ID)}`]: {
        status: 409,
        body: apiError(
          'conflict',
          'This scenario was saved as revision 3 since you opened revision 2; reload it and apply your changes again.',
        ),
      },
      [`GET ${apiRoutes.scenario(SCENARIO_ID)}`]: () => ({
        status: 200,
        body: scenarioDetail({ latestRevision: revision(latest) }),
      }),
    });
    await user.click(section('General'));
    const takt = screen.getByLabelText<HTMLInputElement>('Target takt (s)');
    await user.clear(takt);
    await user.type(takt, '8.5');
    const save = screen.getByRole('button', { name: 'Save as revision 3' });
    await waitFor(() => expect(save.hasAttribute('disabled')).toBe(false));
    latest = 3;
    await user.click(save);
    await waitFor(() => expect(api.callsTo('POST', apiRoutes.scenarioRevisions(SCENARIO_ID))).toHaveLength(1));
    expect(await screen.findByText('Someone else saved this scenario while you were editing')).toBeTruthy();
    expect(takt.value).toBe('8.5');
    await user.click(screen.getByRole('button', { name: 'Keep my changes on top of the latest revision' }));
    expect(await screen.findByRole('button', { name: 'Save as revision 4' })).toBeTruthy();
    expect(screen.getByLabelText<HTMLInputElement>('Target takt (s)').value).toBe('8.5');
    expect(api.callsTo('POST', apiRoutes.scenarioRevisions(SCENARIO_ID))[0].body).toMatchObject({
      baseRevisionNumber: 2,
    });
  });

  it('lists every problem of an imported file with its path and leaves the draft alone', async () => {
    const { user } = await openScenarioPage('engineer');
    const broken = structuredClone(stackedLoop) as unknown as {
      carriers: { count: number };
      lanes: { deckId: string }[];
    };
    broken.carriers.count = 0;
    broken.lanes[0].deckId = 'mezzanine';
    const file = new File([JSON.stringify(broken)], 'broken.json', { type: 'application/json' });
    await user.upload(screen.getByLabelText('Import scenario JSON'), file);

    const banner = await screen.findByText(/broken.json was not imported: 2 problems/);
    const items = within(banner.closest('[role="alert"]') as HTMLElement)
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(items).toEqual(
      expect.arrayContaining([
        'Carriers count: count must be from 1 to 2000',
        expect.stringContaining(`Lane '${stackedLoop.lanes[0].name}', deck id: no deck "mezzanine"`),
      ]),
    );
    expect(screen.getByText('No unsaved changes')).toBeTruthy();
  });

  it('says plainly when a JSON file is not a scenario at all, or where a field is missing', async () => {
    const { user } = await openScenarioPage('engineer');
    const noSteps: Record<string, unknown> = structuredClone(stackedLoop);
    delete noSteps.steps;
    await user.upload(
      screen.getByLabelText('Import scenario JSON'),
      new File([JSON.stringify(noSteps)], 'list.json', { type: 'application/json' }),
    );
    const banner = await screen.findByText(/list.json was not imported: 1 problem/);
    const items = within(banner.closest('[role="alert"]') as HTMLElement)
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(items).toEqual(["This file is not a Lanewright scenario: the field 'steps' is missing"]);

    const noMean = structuredClone(stackedLoop) as unknown as {
      steps: { stations: { name: string; cycleTimeSeconds: Record<string, unknown> }[] }[];
    };
    delete noMean.steps[2].stations[0].cycleTimeSeconds.mean;
    await user.upload(
      screen.getByLabelText('Import scenario JSON'),
      new File([JSON.stringify(noMean)], 'no-mean.json', { type: 'application/json' }),
    );
    const second = await screen.findByText(/no-mean.json was not imported/);
    const texts = within(second.closest('[role="alert"]') as HTMLElement)
      .getAllByRole('listitem')
      .map((li) => li.textContent ?? '');
    expect(texts).toContain(`Station '${noMean.steps[2].stations[0].name}', cycle time mean is missing`);
    expect(texts.join(' ')).not.toMatch(/expected|received|steps\[/);
  });

  it('shows a viewer no save, import or restore controls', async () => {
    await openScenarioPage('viewer');
    expect(screen.queryByRole('button', { name: /Save as revision/ })).toBeNull();
    expect(screen.queryByLabelText('Import scenario JSON')).toBeNull();
    expect(screen.queryByRole('button', { name: /Restore/ })).toBeNull();
    expect(screen.getByLabelText<HTMLInputElement>('Scenario name').disabled).toBe(true);
  });
});
