import { screen, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/api/roles';
import { apiRoutes } from '../../../shared/api/routes';
import type { Revision } from '../../../shared/api/scenarios';
import type { RunResult } from '../../../shared/results/run-result';
import { formatTable } from '../../../workers/cli/table';
import { mockApi } from '../support/fetch-mock';
import { me, project, revision, scenarioDetail, scenarioSummary, session } from '../support/fixtures';
import { renderApp } from '../support/render-app';
import { withinWholeBins } from '../../../src/features/results/utils/chart-data';
import { engineResult, storedRun } from './support/engine-result';

let result: RunResult;

beforeAll(async () => {
  result = await engineResult();
}, 60_000);

function mockRunPage(role: Role) {
  const run = storedRun(result);
  const detail = scenarioDetail();
  const rev: Revision = { ...revision(2), document: detail.document };
  mockApi({
    [`GET ${apiRoutes.session}`]: session(me(role)),
    [`GET ${apiRoutes.run(run.id)}`]: { status: 200, body: run },
    [`GET ${apiRoutes.scenario(scenarioSummary().id)}`]: { status: 200, body: detail },
    [`GET ${apiRoutes.project(project().id)}`]: { status: 200, body: project() },
    [`GET ${apiRoutes.scenarioRevision(scenarioSummary().id, 2)}`]: { status: 200, body: rev },
  });
  return run;
}

/** The figures `npm run simulate` prints for the same result, e.g. "371.4  (95% CI 349.4 to 393.4)". */
function cliFigures(label: string): [string, string, string] {
  const line = formatTable(result)
    .split('\n')
    .find((l) => l.startsWith(label));
  const match = line?.match(/(-?[\d.]+)\s+\(95% CI (-?[\d.]+) to (-?[\d.]+)\)/);
  if (!match) throw new Error(`no "${label}" line in the CLI table`);
  return [match[1], match[2], match[3]];
}

const figure = (label: string) => {
  const element = document.querySelector(`[data-figure="${label}"]`);
  if (!element) throw new Error(`no headline figure "${label}"`);
  return (element.textContent ?? '').replace(/,/g, '');
};

describe('run result page', { timeout: 60_000 }, () => {
  it('shows the engine’s headline figures exactly as the command line prints them, with the verdict against target takt', async () => {
    const run = mockRunPage('viewer');
    renderApp(`/runs/${run.id}`);
    await screen.findByRole('heading', { level: 1, name: run.name });

    for (const [label, cli] of [
      ['Throughput', 'throughput'],
      ['Achieved takt', 'takt'],
      ['Annual output', 'annual output'],
    ] as const) {
      const [mean, low, high] = cliFigures(cli);
      expect(figure(label)).toContain(mean);
      expect(figure(label)).toContain(`95 % CI ${low} to ${high}`);
    }
    expect(figure('Annual output')).toContain(`Over ${Math.round(result.hoursPerYear)} scheduled hours`);
    expect(figure('Work in progress')).toContain(result.wip.mean.toFixed(2));
    expect(figure('Lead time')).toContain(result.leadTimeSeconds.mean.toFixed(1));
    expect(figure('Lead time')).toContain(`95th percentile ${result.leadTimeSeconds.p95.toFixed(1)} s`);

    const target = result.targetTaktSeconds;
    expect(target).not.toBeNull();
    const verdict = document.querySelector('[data-verdict]')?.textContent ?? '';
    if (result.taktSeconds.mean <= (target ?? 0))
      expect(verdict).toContain(`Meets the target takt of ${(target ?? 0).toFixed(2)} s`);
    else
      expect(verdict).toContain(
        `Misses the target takt of ${(target ?? 0).toFixed(2)} s by ${(result.taktSeconds.mean - (target ?? 0)).toFixed(2)} s`,
      );
  });

  it('names the bottleneck, draws both heatmaps and states the safety caution', async () => {
    const run = mockRunPage('viewer');
    renderApp(`/runs/${run.id}`);
    await screen.findByRole('heading', { level: 1, name: run.name });

    const bottleneck = result.stations.find((s) => s.id === result.bottleneckStationId);
    expect(bottleneck).toBeDefined();
    expect(screen.getByTestId('bottleneck-sentence').textContent).toContain(
      `${bottleneck?.name} is the bottleneck: the sole bottleneck ${(100 * (bottleneck?.soleBottleneckShare ?? 0)).toFixed(1)} %`,
    );
    const stationRows = within(screen.getByRole('table', { name: 'Station time shares and bottleneck' })).getAllByRole(
      'row',
    );
    expect(stationRows).toHaveLength(result.stations.length + 1);
    const workTable = screen.getByRole('table', { name: 'Station cycle, output and queue' });
    expect(await within(workTable).findByText('Press seat ring')).toBeTruthy();

    for (const chart of ['space-time', 'station-timeline']) {
      const frame = document.querySelector(`[data-chart="run-${run.id.slice(0, 8)}-${chart}"]`);
      expect(frame?.querySelector('svg[role="img"]')).not.toBeNull();
    }
    expect(screen.getByRole('complementary', { name: 'Safety caution' }).textContent).toContain(
      'not a safety sign-off',
    );
    expect(screen.getByText(/Scenario revision/).parentElement?.textContent).toContain('revision 2');
    expect(screen.getByText(String(result.seed), { selector: 'code' })).toBeTruthy();
  });

  it('shows a viewer no delete, rename or rerun control', async () => {
    const run = mockRunPage('viewer');
    renderApp(`/runs/${run.id}`);
    await screen.findByRole('heading', { level: 1, name: run.name });
    await screen.findByRole('button', { name: 'Save the station table for controls as CSV' });
    expect(screen.queryByRole('button', { name: /^Delete/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Rename/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Rerun/ })).toBeNull();
  });

  it('offers the run’s author the delete control', async () => {
    const run = mockRunPage('engineer');
    renderApp(`/runs/${run.id}`);
    expect(await screen.findByRole('button', { name: `Delete ${run.name}` })).toBeTruthy();
  });
});

describe('station timeline shares', () => {
  it('scales only bins whose four-decimal shares add up past 1, and leaves the rest as stored', () => {
    const shares = [0.5378, 0.0472, 0.4151, 0, 0, 0.25, 0.25, 0.25, 0.25, 0];
    const out = withinWholeBins(shares, 5);
    expect(out.slice(0, 5).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    expect(out[0] / out[2]).toBeCloseTo(0.5378 / 0.4151, 12);
    expect(out.slice(5)).toEqual([0.25, 0.25, 0.25, 0.25, 0]);
  });
});
