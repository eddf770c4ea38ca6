// The runs table shows the page the server answers and asks the server for every sort, filter and
// page change: the requests it sends are checked here, the server's own sorting in tests/api/run-paging.
import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { apiRoutes } from '../../../shared/api/routes';
import type { Role } from '../../../shared/api/roles';
import type { RunListItem, RunsPage } from '../../../shared/api/runs';
import { RunListSection } from '../../../src/features/runs/components/run-list-section';
import { formatDay } from '../../../src/lib/format';
import { mockApi, type RecordedCall } from '../support/fetch-mock';
import { me, ORG_ID, session, USER, uuid } from '../support/fixtures';
import { inProcessPorts } from './support/in-process-port';
import { renderWithSession } from './support/render-with-session';
import { OTHER_USER, runItem } from './support/runs-fixtures';

const SCENARIO_ID = uuid(20);
const runs = [
  runItem(4, { throughput: 301.5, author: OTHER_USER, revision: 3 }),
  runItem(3, { throughput: 352.9, carriers: 24 }),
  runItem(2, { throughput: 295.7, author: OTHER_USER }),
  runItem(1, { throughput: 310.2 }),
];
/** The list has 60 runs in all; the mock answers the four above as whatever page is asked for. */
const TOTAL = 60;

function pageFor(call: RecordedCall, items: readonly RunListItem[] = runs): RunsPage {
  const params = new URLSearchParams(call.search);
  return {
    items: [...items],
    total: TOTAL,
    offset: Number(params.get('offset') ?? 0),
    limit: Number(params.get('limit') ?? 25),
    choices: {
      authors: [
        { id: USER.id, name: USER.name },
        { id: OTHER_USER.id, name: OTHER_USER.name },
        { id: null, name: '' },
      ],
      revisions: [2, 3],
      carriers: [20, 24],
    },
  };
}

function renderTable(role: Role, extra: Parameters<typeof mockApi>[0] = {}) {
  const api = mockApi({
    [`GET ${apiRoutes.session}`]: session(me(role)),
    [`GET ${apiRoutes.scenarioRuns(SCENARIO_ID)}`]: (call) => ({ status: 200, body: pageFor(call) }),
    ...extra,
  });
  const rendered = renderWithSession(
    <RunListSection scope={{ scenarioId: SCENARIO_ID }} organisationId={ORG_ID} caption="Runs of this scenario" />,
    inProcessPorts().open,
  );
  /** The query of the latest list request, as a plain object. */
  const lastQuery = () => {
    const listCalls = api.callsTo('GET', apiRoutes.scenarioRuns(SCENARIO_ID));
    return Object.fromEntries(new URLSearchParams(listCalls[listCalls.length - 1].search));
  };
  return { ...rendered, api, lastQuery };
}

const runOrder = () =>
  within(screen.getByRole('table', { name: 'Runs of this scenario' }))
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('link')[0].textContent);

describe('runs table', () => {
  it('asks for the first 25 runs, newest first, and shows them in the order the server gave', async () => {
    const { lastQuery } = renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    expect(runOrder()).toEqual(['Run 4', 'Run 3', 'Run 2', 'Run 1']);
    expect(lastQuery()).toEqual({ sort: 'createdAt', order: 'desc', limit: '25', offset: '0' });
  });

  it('asks the server to sort by throughput, highest first, then lowest first, back on page one', async () => {
    const { user, lastQuery } = renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    await user.click(screen.getByRole('button', { name: 'Next' }));
    await vi.waitFor(() => expect(lastQuery().offset).toBe('25'));

    const header = screen.getByRole('button', { name: /Throughput/ });
    await user.click(header);
    await vi.waitFor(() => expect(lastQuery()).toMatchObject({ sort: 'throughput', order: 'desc', offset: '0' }));
    expect(header.closest('th')?.getAttribute('aria-sort')).toBe('descending');
    await user.click(header);
    await vi.waitFor(() => expect(lastQuery()).toMatchObject({ sort: 'throughput', order: 'asc' }));
    expect(header.closest('th')?.getAttribute('aria-sort')).toBe('ascending');
  });

  it('pages forward and back, saying which runs of how many are shown', async () => {
    const { user, lastQuery } = renderTable('viewer');
    const pages = await screen.findByRole('navigation', { name: 'Run pages' });
    expect(pages.textContent).toContain('1–25 of 60');
    expect(within(pages).getByRole('button', { name: 'Previous' })).toHaveProperty('disabled', true);
    await user.click(within(pages).getByRole('button', { name: 'Next' }));
    await vi.waitFor(() =>
      expect(screen.getByRole('navigation', { name: 'Run pages' }).textContent).toContain('26–50 of 60'),
    );
    expect(lastQuery()).toMatchObject({ offset: '25', limit: '25' });
    await user.click(screen.getByRole('button', { name: 'Next' }));
    await vi.waitFor(() =>
      expect(screen.getByRole('navigation', { name: 'Run pages' }).textContent).toContain('51–60 of 60'),
    );
    expect(screen.getByRole('button', { name: 'Next' })).toHaveProperty('disabled', true);
    // The page before was read already: it comes from the cache.
    await user.click(screen.getByRole('button', { name: 'Previous' }));
    await vi.waitFor(() =>
      expect(screen.getByRole('navigation', { name: 'Run pages' }).textContent).toContain('26–50 of 60'),
    );
  });

  it('sends the filters to the server, offering every author the list holds, a former member too', async () => {
    const { user, lastQuery } = renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    expect(
      within(screen.getByLabelText('Author'))
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['Anyone', USER.name, OTHER_USER.name, 'a former member']);
    await user.selectOptions(screen.getByLabelText('Author'), OTHER_USER.name);
    await vi.waitFor(() => expect(lastQuery()).toMatchObject({ createdBy: OTHER_USER.id, offset: '0' }));
    await user.selectOptions(screen.getByLabelText('Author'), 'a former member');
    await vi.waitFor(() => expect(lastQuery().createdBy).toBe('former'));
    await user.click(screen.getByRole('button', { name: 'Clear filters' }));
    await user.selectOptions(screen.getByLabelText('Carriers'), '24');
    await vi.waitFor(() =>
      expect(lastQuery()).toEqual({ sort: 'createdAt', order: 'desc', limit: '25', offset: '0', carriers: '24' }),
    );
    await user.type(screen.getByLabelText('Throughput at least (/h)'), '300');
    await vi.waitFor(() => expect(lastQuery().minThroughput).toBe('300'));
  });

  it('sends "run on or after" as the start of that day in the user’s time zone', async () => {
    const { user, lastQuery } = renderTable('viewer');
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    const menu = screen.getByLabelText('Run on or after');
    const today = new Date();
    const weekAgo = new Date(today.getFullYear(), today.getMonth(), today.getDate() - 6);
    const label = `Last 7 days (from ${formatDay(weekAgo)})`;
    expect(within(menu).getByRole('option', { name: label })).toBeTruthy();
    // The browser's own date field would read mm/dd/yyyy; the menu writes days as the app does.
    expect(label).toMatch(/\(from \d{1,2} [A-Z][a-z]{2} \d{4}\)$/);
    await user.selectOptions(menu, label);
    await vi.waitFor(() => expect(lastQuery().since).toBe(weekAgo.toISOString()));
  });

  it('says so when no run matches the filters, and keeps the filters to change', async () => {
    const { user } = renderTable('viewer', {
      [`GET ${apiRoutes.scenarioRuns(SCENARIO_ID)}`]: (call) => {
        const filtered = new URLSearchParams(call.search).has('carriers');
        return { status: 200, body: { ...pageFor(call, filtered ? [] : runs), total: filtered ? 0 : TOTAL } };
      },
    });
    await screen.findByRole('table', { name: 'Runs of this scenario' });
    await user.selectOptions(screen.getByLabelText('Carriers'), '24');
    expect(await screen.findByText('No run matches these filters.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Clear filters' })).toBeTruthy();
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
    const { api, user } = renderTable('owner', {
      [`DELETE ${apiRoutes.run(runs[2].id)}`]: { status: 200, body: { ok: true } },
    });
    await user.click(await screen.findByRole('button', { name: 'Delete Run 2' }));
    expect(api.callsTo('DELETE', apiRoutes.run(runs[2].id))).toHaveLength(0);
    await user.click(
      within(screen.getByRole('group', { name: 'Confirm deleting Run 2' })).getByRole('button', { name: 'Delete run' }),
    );
    await vi.waitFor(() => expect(api.callsTo('DELETE', apiRoutes.run(runs[2].id))).toHaveLength(1));
  });

  it('renames a run in place', async () => {
    const { api, user } = renderTable('engineer', {
      [`PATCH ${apiRoutes.run(runs[3].id)}`]: { status: 200, body: { ...runs[3], name: 'Baseline, 20 carriers' } },
    });
    await user.click(await screen.findByRole('button', { name: 'Rename Run 1' }));
    const input = screen.getByLabelText('New run name');
    await user.clear(input);
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect((await screen.findByRole('alert')).textContent).toContain('The name is required');
    await user.type(input, 'Baseline, 20 carriers{Enter}');
    await vi.waitFor(() =>
      expect(api.callsTo('PATCH', apiRoutes.run(runs[3].id)).map((c) => c.body)).toEqual([
        { name: 'Baseline, 20 carriers' },
      ]),
    );
  });
});
