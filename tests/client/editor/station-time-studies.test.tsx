// The station form of the scenario editor shows the time studies of the open station, and a fit
// chosen there becomes that station's cycle time in the draft.
import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { apiRoutes } from '../../../shared/api/routes';
import type { TimeStudyDetail } from '../../../shared/api/time-studies';
import { analyseTimeStudy } from '../../../workers/analysis';
import { USER, uuid } from '../support/fixtures';
import { openScenarioPage, SCENARIO_ID } from './workspace-fixtures';

vi.setConfig({ testTimeout: 30_000 });

beforeAll(async () => {
  await import('../../../src/app/routes/scenario-route');
}, 60_000);

afterEach(() => window.sessionStorage.clear());

const STUDY_ID = uuid(21);
/** Invented press times, skewed to the right around 9.5 s. */
const SAMPLES = Array.from({ length: 60 }, (_, i) => Math.round((8 + (3 * ((i * 29) % 61) ** 2) / 3721) * 100) / 100);

function pressStudy(): TimeStudyDetail {
  const analysis = analyseTimeStudy(SAMPLES);
  return {
    id: STUDY_ID,
    scenarioId: SCENARIO_ID,
    stationId: 'PR',
    name: 'Press, morning shift',
    fileName: 'press-morning.csv',
    column: 'cycle_s',
    count: SAMPLES.length,
    mean: analysis.summary.mean,
    sd: analysis.summary.sd,
    createdBy: USER,
    createdAt: '2026-11-30T08:00:00.000Z',
    samples: SAMPLES,
    analysis,
  };
}

const section = (name: string) =>
  within(screen.getByRole('navigation', { name: 'Scenario sections' })).getByRole('button', {
    name: new RegExp(`^${name}`),
  });

async function openPressStation(role: 'engineer' | 'viewer') {
  const detail = pressStudy();
  const { samples: _samples, analysis: _analysis, ...listed } = detail;
  const app = await openScenarioPage(role, {
    [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: { status: 200, body: [listed] },
    [`GET ${apiRoutes.timeStudy(STUDY_ID)}`]: { status: 200, body: detail },
  });
  await app.user.click(section('Process and stations'));
  await app.user.click(screen.getByRole('button', { name: /^Step 2: Press seat ring/ }));
  await app.user.click(screen.getByRole('button', { name: 'Station PR' }));
  return { ...app, detail };
}

describe('time studies in the station form', () => {
  it('shows the studies of the open station and makes a chosen fit its cycle time', async () => {
    const { user, api, detail } = await openPressStation('engineer');
    expect(await screen.findByRole('heading', { name: 'Time studies of Press' })).toBeTruthy();
    expect(api.callsTo('GET', apiRoutes.scenarioTimeStudies(SCENARIO_ID))[0].search).toBe('?stationId=PR');

    await user.click(await screen.findByRole('button', { name: 'Use this fit: Gamma' }));
    const fitted = detail.analysis.candidates.find((c) => c.kind === 'gamma');
    const gamma = fitted?.status === 'fitted' ? fitted.distribution : null;
    if (gamma?.kind !== 'gamma') throw new Error('the sample set should admit a gamma fit');
    const cycleTime = document.querySelector(
      '[data-distribution="steps.1.stations.0.cycleTimeSeconds"]',
    ) as HTMLElement;
    await waitFor(() => expect(within(cycleTime).getByLabelText<HTMLSelectElement>('Kind').value).toBe('gamma'));
    expect(Number(within(cycleTime).getByLabelText<HTMLInputElement>('Mean (s)').value)).toBeCloseTo(gamma.mean, 6);
    expect(Number(within(cycleTime).getByLabelText<HTMLInputElement>('CV').value)).toBeCloseTo(gamma.cv, 6);
    expect(await screen.findByText('Unsaved changes')).toBeTruthy();
  });

  it('shows a viewer the analysis without the controls that change the cycle time', async () => {
    await openPressStation('viewer');
    expect(await screen.findByText('Standard deviation')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /^Use/ })).toBeNull();
    expect(screen.queryByLabelText(/Upload a time study/)).toBeNull();
  });
});
