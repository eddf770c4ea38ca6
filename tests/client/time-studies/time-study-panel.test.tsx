// The time-study panel against a stubbed API: it shows the study's statistics and fitted candidates,
// hands the station form a distribution the scenario schema accepts, uploads as multipart with the
// server's messages shown, and shows viewers the analysis without the controls.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi, type Mock } from 'vitest';
import { apiRoutes } from '../../../shared/api/routes';
import type { TimeStudyDetail } from '../../../shared/api/time-studies';
import { distributionSchema, type Distribution } from '../../../shared/scenario/distribution';
import { TimeStudyPanel } from '../../../src/features/time-studies';
import { analyseTimeStudy } from '../../../workers/analysis';
import { apiError, mockApi } from '../support/fetch-mock';
import { USER, uuid } from '../support/fixtures';

const SCENARIO_ID = uuid(10);
const STUDY_ID = uuid(11);
const NEW_STUDY_ID = uuid(12);

/** A right-skewed set of press times around 10 s, the kind a manual station produces. */
const SAMPLES = Array.from(
  { length: 120 },
  (_, i) => Math.round((8.5 + (3 * ((i * 37) % 101) ** 2) / 10_201) * 100) / 100,
);

function study(id = STUDY_ID, samples = SAMPLES, name = 'Press, week 12'): TimeStudyDetail {
  const analysis = analyseTimeStudy(samples);
  return {
    id,
    scenarioId: SCENARIO_ID,
    stationId: 'press',
    name,
    fileName: 'press-week-12.csv',
    column: 'cycle_s',
    count: samples.length,
    mean: analysis.summary.mean,
    sd: analysis.summary.sd,
    createdBy: USER,
    createdAt: '2026-11-30T08:00:00.000Z',
    samples,
    analysis,
  };
}

function listItem(detail: TimeStudyDetail) {
  const { samples: _samples, analysis: _analysis, ...item } = detail;
  return item;
}

function renderPanel(canEdit: boolean, stationId = 'press') {
  const onUse = vi.fn<(d: Distribution) => void>();
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <TimeStudyPanel
        scenarioId={SCENARIO_ID}
        stationId={stationId}
        stationName="Press"
        canEdit={canEdit}
        onUse={onUse}
      />
    </QueryClientProvider>,
  );
  return { onUse, user: userEvent.setup() };
}

function statValue(term: string): string {
  const dt = screen.getAllByText(term).find((el) => el.tagName === 'DT');
  return dt?.nextElementSibling?.textContent ?? '';
}

describe('TimeStudyPanel', () => {
  it('shows the stored study’s statistics, histogram with fits, and candidates best first', async () => {
    const detail = study();
    const api = mockApi({
      [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: { status: 200, body: [listItem(detail)] },
      [`GET ${apiRoutes.timeStudy(STUDY_ID)}`]: { status: 200, body: detail },
    });
    renderPanel(true);
    await screen.findByText('Standard deviation');
    expect(api.calls[0].search).toBe('?stationId=press');
    expect(statValue('Samples')).toBe('120');
    expect(statValue('Mean')).toBe(
      `${new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4 }).format(detail.analysis.summary.mean)} s`,
    );
    expect(statValue('Coefficient of variation')).toBe(
      new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4 }).format(detail.analysis.summary.cv ?? 0),
    );
    expect(document.querySelectorAll('[data-chart-part="fit"]')).toHaveLength(3);
    // The chart draws the server's Freedman–Diaconis bins, the same number the caption quotes.
    const bars = Array.from(document.querySelectorAll('[data-chart-part="marks"] rect'));
    expect(bars).toHaveLength(detail.analysis.histogram.bins.length);
    expect(
      screen.getByText(new RegExp(`${detail.analysis.histogram.bins.length} bins by the Freedman–Diaconis rule`)),
    ).toBeTruthy();
    const table = screen.getByRole('table', { name: /Fitted distributions/ });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => (r as HTMLTableRowElement).cells[0].textContent?.replace('closest', ''))).toEqual(
      detail.analysis.candidates.map((c) => ({ normal: 'Normal', lognormal: 'Lognormal', gamma: 'Gamma' })[c.kind]),
    );
  });

  it('hands the form the measured samples as an empirical distribution, or a chosen fit, both valid scenario distributions', async () => {
    const detail = study();
    mockApi({
      [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: { status: 200, body: [listItem(detail)] },
      [`GET ${apiRoutes.timeStudy(STUDY_ID)}`]: { status: 200, body: detail },
    });
    const { onUse, user } = renderPanel(true);
    await user.click(await screen.findByRole('button', { name: 'Use measured samples' }));
    const empirical = distributionSchema.parse(onUse.mock.calls[0][0]);
    expect(empirical).toEqual({ kind: 'empirical', samples: SAMPLES });
    expect(screen.getByRole('status').textContent).toBe('The cycle time of Press is now the 120 measured samples.');

    await user.click(screen.getByRole('button', { name: 'Use this fit: Gamma' }));
    const gamma = distributionSchema.parse(onUse.mock.calls[1][0]);
    const fitted = detail.analysis.candidates.find((c) => c.kind === 'gamma');
    expect(gamma).toEqual(fitted?.status === 'fitted' ? fitted.distribution : null);
    expect(gamma.kind === 'gamma' && gamma.mean).toBeCloseTo(detail.analysis.summary.mean, 10);
  });

  it('viewers see the analysis but cannot upload, use or delete', async () => {
    const detail = study();
    mockApi({
      [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: { status: 200, body: [listItem(detail)] },
      [`GET ${apiRoutes.timeStudy(STUDY_ID)}`]: { status: 200, body: detail },
    });
    renderPanel(false);
    await screen.findByText('Standard deviation');
    expect(screen.queryByLabelText(/Upload a time study/)).toBeNull();
    expect(screen.queryByRole('button', { name: /Use/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /Delete/ })).toBeNull();
  });

  it('uploads the chosen file as multipart, shows the server’s message on refusal, and the new study on success', async () => {
    const created = study(NEW_STUDY_ID, [9.1, 9.4, 10.2, 9.8, 11.0], 'screwing');
    let accept = false;
    let listed: TimeStudyDetail[] = [];
    mockApi({
      [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: () => ({ status: 200, body: listed.map(listItem) }),
      [`POST ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: () => {
        if (!accept)
          return {
            status: 400,
            body: apiError(
              'bad_request',
              'One row could not be read: row 4, column "cycle_s": "abc" is not a number.',
              [{ path: 'file', message: 'row 4, column "cycle_s": "abc" is not a number' }],
            ),
          };
        listed = [created];
        return { status: 201, body: created };
      },
    });
    const { user } = renderPanel(true);
    await screen.findByText(/No time study yet/);
    const input = screen.getByLabelText('Upload a time study (CSV)');
    await user.upload(input, new File(['cycle_s\n9.1\n9.4\nabc\n'], 'screwing.csv', { type: 'text/csv' }));
    expect((await screen.findByRole('alert')).textContent).toContain('row 4, column "cycle_s": "abc" is not a number');
    const [, init] = (fetch as Mock).mock.calls.find(([, i]) => i?.method === 'POST') ?? [];
    const form = init?.body as FormData;
    expect(form.get('stationId')).toBe('press');
    expect((form.get('file') as File).name).toBe('screwing.csv');

    accept = true;
    await user.upload(input, new File(['cycle_s\n9.1\n9.4\n10.2\n9.8\n11.0\n'], 'screwing.csv', { type: 'text/csv' }));
    await screen.findByRole('button', { name: /^screwing/ });
    expect(statValue('Samples')).toBe('5');
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('states each problem of a refused upload once', async () => {
    const rowProblems = [
      'row 3, column "cycle_s": "abc" is not a number',
      'row 5, column "cycle_s": "-2" is below zero',
    ];
    mockApi({
      [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: { status: 200, body: [] },
      [`POST ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: {
        status: 400,
        body: apiError(
          'bad_request',
          `2 rows could not be read: ${rowProblems.join('; ')}.`,
          rowProblems.map((message) => ({ path: 'file', message })),
        ),
      },
    });
    const { user } = renderPanel(true);
    await user.upload(
      await screen.findByLabelText('Upload a time study (CSV)'),
      new File(['cycle_s\n9\nabc\n9\n-2\n'], 'bad.csv', { type: 'text/csv' }),
    );
    const alert = await screen.findByRole('alert');
    for (const problem of rowProblems) expect(alert.textContent?.split(problem)).toHaveLength(2);
  });

  it('deletes a study after a second press and refetches the list', async () => {
    const detail = study();
    let listed = [detail];
    const api = mockApi({
      [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: () => ({ status: 200, body: listed.map(listItem) }),
      [`GET ${apiRoutes.timeStudy(STUDY_ID)}`]: { status: 200, body: detail },
      [`DELETE ${apiRoutes.timeStudy(STUDY_ID)}`]: () => {
        listed = [];
        return { status: 200, body: { ok: true } };
      },
    });
    const { user } = renderPanel(true);
    await user.click(await screen.findByRole('button', { name: 'Delete time study Press, week 12' }));
    expect(api.callsTo('DELETE', apiRoutes.timeStudy(STUDY_ID))).toHaveLength(0);
    await user.click(
      screen.getByRole('button', { name: 'Confirm: delete the 120 samples of Press, week 12 for everyone' }),
    );
    await screen.findByText(/No time study yet/);
    expect(api.callsTo('DELETE', apiRoutes.timeStudy(STUDY_ID))).toHaveLength(1);
  });

  it('asks for a valid station id before fetching anything', () => {
    const api = mockApi({});
    renderPanel(true, 'press #2');
    expect(screen.getByText(/give the station a valid id first/)).toBeTruthy();
    expect(api.calls).toHaveLength(0);
  });

  it('refuses a file over 1 MB or of another type before sending it', async () => {
    const api = mockApi({ [`GET ${apiRoutes.scenarioTimeStudies(SCENARIO_ID)}`]: { status: 200, body: [] } });
    const { user } = renderPanel(true);
    const input = await screen.findByLabelText('Upload a time study (CSV)');
    await user.upload(input, new File(['9.5\n'.repeat(850_000)], 'big.csv', { type: 'text/csv' }));
    expect((await screen.findByRole('alert')).textContent).toContain('The file is 3.2 MB; the limit is 1 MB.');
    // The picker's accept list is only a hint: "All files" and drag-and-drop let anything through.
    await userEvent.setup({ applyAccept: false }).upload(input, new File(['x'], 'times.xlsx'));
    await waitFor(() =>
      expect(screen.getByRole('alert').textContent).toContain('"times.xlsx" is not a CSV or text file'),
    );
    expect(api.calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });
});
