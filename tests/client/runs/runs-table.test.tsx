import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiRoutes } from '../../../shared/api/routes';
import type { Role } from '../../../shared/api/roles';
import { RunsTable } from '../../../src/features/runs/components/runs-table';
import { mockApi } from '../support/fetch-mock';
import { me, ORG_ID, session } from '../support/fixtures';
import { inProcessPorts } from './support/in-process-port';
import { renderWithSession } from './support/render-with-session';
import { OTHER_USER, runItem } from './support/runs-fixtures';

const runs = [
  runItem(1, { throughput: 310.2 }),
  runItem(2, { throughput: 295.7, author: OTHER_USER }),
  runItem(3, { throughput: 352.9, carriers: 24 }),
  runItem(4, { throughput: 301.5, author: OTHER_USER, revision: 3 }),
];

function renderTable(role: Role) {
  mockApi({ [`GET ${apiRoutes.session}`]: session(me(role)) });
  return renderWithSession(
    <RunsTable runs={runs} organisationId={ORG_ID} caption="Runs of this scenario" />,
    inProcessPorts().open,
  );
}

const runOrder = () =>
  within(screen.getByRole('table', { name: 'Runs of this scenario' }))
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('link')[0].textContent);

describe('runs table', () => {
  it('sorts by throughput, highest first, then lowest first', async () => {
    const { user } = renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    expect(runOrder()).toEqual(['Run 4', 'Run 3', 'Run 2', 'Run 1']);

    const header = screen.getByRole('button', { name: /Throughput/ });
    await user.click(header);
    expect(runOrder()).toEqual(['Run 3', 'Run 1', 'Run 4', 'Run 2']);
    expect(header.closest('th')?.getAttribute('aria-sort')).toBe('descending');
    await user.click(header);
    expect(runOrder()).toEqual(['Run 2', 'Run 4', 'Run 1', 'Run 3']);
    expect(header.closest('th')?.getAttribute('aria-sort')).toBe('ascending');
  });

  it('filters by author and by carriers', async () => {
    const { user } = renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    await user.selectOptions(screen.getByLabelText('Author'), OTHER_USER.name);
    expect(runOrder()).toEqual(['Run 4', 'Run 2']);
    await user.click(screen.getByRole('button', { name: 'Clear filters' }));
    await user.selectOptions(screen.getByLabelText('Carriers'), '24');
    expect(runOrder()).toEqual(['Run 3']);
  });

  it('offers the days runs were made, written as the app writes dates, and keeps runs from that day on', async () => {
    const { user } = renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    const since = screen.getByLabelText('Run on or after');
    // The fixtures make runs 1–4 on 11–14 Nov 2026 at 09:00 UTC.
    expect(
      within(since)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['Any day', '14 Nov 2026', '13 Nov 2026', '12 Nov 2026', '11 Nov 2026']);
    await user.selectOptions(since, '13 Nov 2026');
    expect(runOrder()).toEqual(['Run 4', 'Run 3']);
  });

  it('shows a viewer no rename, delete or rerun', async () => {
    renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    expect(screen.queryByRole('button', { name: /^Rename/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Delete/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Rerun/ })).toBeNull();
  });

  it('lets an engineer rerun any run but rename and delete only their own', async () => {
    renderTable('engineer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    expect(screen.getAllByRole('button', { name: /^Rerun/ })).toHaveLength(4);
    expect(screen.getAllByRole('button', { name: /^Rename/ }).map((b) => b.getAttribute('aria-label'))).toEqual([
      'Rename Run 3',
      'Rename Run 1',
    ]);
    expect(screen.getAllByRole('button', { name: /^Delete/ }).map((b) => b.getAttribute('aria-label'))).toEqual([
      'Delete Run 3',
      'Delete Run 1',
    ]);
  });

  it('lets an owner delete anyone’s run after confirming', async () => {
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(me('owner')),
      [`DELETE ${apiRoutes.run(runs[1].id)}`]: { status: 200, body: { ok: true } },
    });
    const { user } = renderWithSession(
      <RunsTable runs={runs} organisationId={ORG_ID} caption="Runs of this scenario" />,
      inProcessPorts().open,
    );
    await user.click(await screen.findByRole('button', { name: 'Delete Run 2' }));
    expect(api.callsTo('DELETE', apiRoutes.run(runs[1].id))).toHaveLength(0);
    await user.click(
      within(screen.getByRole('group', { name: 'Confirm deleting Run 2' })).getByRole('button', { name: 'Delete run' }),
    );
    await vi.waitFor(() => expect(api.callsTo('DELETE', apiRoutes.run(runs[1].id))).toHaveLength(1));
  });

  it('renames a run in place', async () => {
    const api = mockApi({
      [`GET ${apiRoutes.session}`]: session(me('engineer')),
      [`PATCH ${apiRoutes.run(runs[0].id)}`]: { status: 200, body: { ...runs[0], name: 'Baseline, 20 carriers' } },
    });
    const { user } = renderWithSession(
      <RunsTable runs={runs} organisationId={ORG_ID} caption="Runs of this scenario" />,
      inProcessPorts().open,
    );
    await user.click(await screen.findByRole('button', { name: 'Rename Run 1' }));
    const input = screen.getByLabelText('New run name');
    await user.clear(input);
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect((await screen.findByRole('alert')).textContent).toContain('The name is required');
    await user.type(input, 'Baseline, 20 carriers{Enter}');
    await vi.waitFor(() =>
      expect(api.callsTo('PATCH', apiRoutes.run(runs[0].id)).map((c) => c.body)).toEqual([
        { name: 'Baseline, 20 carriers' },
      ]),
    );
  });
});
