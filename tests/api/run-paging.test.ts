// The runs list pages, sorts and filters on the server: pages at the largest size walk every run once,
// sorting is stable across pages (ties broken by id), filters count towards the total, and every bound
// of the query answers a clear 400 naming its field just past it.
import { describe, expect, it } from 'vitest';
import { apiRoutes } from '../../shared/api/routes';
import { RUNS_OFFSET_MAX, RUNS_PAGE_MAX, runsPageSchema, type RunListItem } from '../../shared/api/runs';
import { useCleanDatabase } from './fixtures/database';
import { useOrganisation } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db, { contentPerTest: false });

/** Beside the fixture's run: 130 copies, by the owner, with throughput in 13 tied groups and names in mixed case. */
const COPIES = 130;
const TOTAL = COPIES + 1;
let seeded = false;

async function seedRuns(): Promise<void> {
  if (seeded) return;
  seeded = true;
  await db().query(
    `INSERT INTO runs (scenario_id, revision_id, client_run_id, name, settings, seed, engine_version,
       throughput_per_hour_mean, takt_seconds_mean, carriers, summary, results, server_checked, created_by_id, created_at)
     SELECT scenario_id, revision_id, gen_random_uuid(),
       CASE WHEN i % 2 = 0 THEN 'copy ' ELSE 'Copy ' END || lpad(i::text, 3, '0'),
       settings, seed, engine_version, 100 + (i % 13), 3600.0 / (100 + (i % 13)), 10 + (i % 3),
       jsonb_set(jsonb_set(jsonb_set(summary,
         '{throughputPerHour,mean}', to_jsonb(100 + (i % 13))),
         '{taktSeconds,mean}', to_jsonb(3600.0 / (100 + (i % 13)))),
         '{carriers}', to_jsonb(10 + (i % 3))),
       results,
       server_checked, $2, created_at - make_interval(mins => i)
     FROM runs, generate_series(1, ${COPIES}) AS i WHERE id = $1`,
    [org.content.runId, org.people.owner.id],
  );
}

async function page(query: Record<string, string | number>) {
  await seedRuns();
  const res = await org.people.viewer.agent.get(apiRoutes.projectRuns(org.content.projectId)).query(query);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return runsPageSchema.parse(res.body);
}

async function walk(query: Record<string, string | number>): Promise<RunListItem[]> {
  const items: RunListItem[] = [];
  for (let offset = 0; ; offset += RUNS_PAGE_MAX) {
    const next = await page({ ...query, limit: RUNS_PAGE_MAX, offset });
    expect(next.total).toBe(TOTAL);
    items.push(...next.items);
    if (next.items.length < RUNS_PAGE_MAX) return items;
  }
}

const ids = (items: RunListItem[]) => items.map((run) => run.id);

describe('paging the runs list', () => {
  it(`answers the largest page (${RUNS_PAGE_MAX}) and the total, newest first by default`, async () => {
    const first = await page({ limit: RUNS_PAGE_MAX });
    expect(first.items).toHaveLength(RUNS_PAGE_MAX);
    expect(first).toMatchObject({ total: TOTAL, offset: 0, limit: RUNS_PAGE_MAX });
    const times = first.items.map((run) => Date.parse(run.createdAt));
    expect(times).toEqual([...times].sort((a, b) => b - a));
    expect(first.items[0].id).toBe(org.content.runId);
    const defaults = await page({});
    expect(defaults.items).toHaveLength(25);
  });

  it('walks every run exactly once, page after page, in a stable order even where values tie', async () => {
    const byThroughput = await walk({ sort: 'throughput', order: 'desc' });
    expect(byThroughput).toHaveLength(TOTAL);
    expect(new Set(ids(byThroughput)).size).toBe(TOTAL);
    const throughputs = byThroughput.map((run) => run.summary.throughputPerHour.mean);
    expect(throughputs).toEqual([...throughputs].sort((a, b) => b - a));
    expect(ids(await walk({ sort: 'throughput', order: 'desc' }))).toEqual(ids(byThroughput));
  });

  it('sorts text ignoring case, both ways, by every column the table offers', async () => {
    const names = (await walk({ sort: 'name', order: 'asc' })).map((run) => run.name.toLowerCase());
    expect(names).toEqual([...names].sort());
    const down = (await page({ sort: 'name', order: 'desc', limit: 3 })).items.map((run) => run.name);
    expect(down[0].toLowerCase() >= down[1].toLowerCase()).toBe(true);
    for (const sort of ['scenario', 'revision', 'author', 'createdAt', 'takt', 'carriers']) {
      expect((await page({ sort, limit: RUNS_PAGE_MAX })).items, sort).toHaveLength(RUNS_PAGE_MAX);
    }
    const carriers = (await walk({ sort: 'carriers', order: 'asc' })).map((run) => run.summary.carriers);
    expect(carriers).toEqual([...carriers].sort((a, b) => a - b));
  });

  it('filters in SQL, the total counts the matches, and the menus still offer every value', async () => {
    // The expected matches are counted here from every run's own summary, independently of the SQL.
    const all = await walk({});
    const count = (keep: (run: RunListItem) => boolean) => all.filter(keep).length;
    const ofTen = await page({ carriers: 10, limit: RUNS_PAGE_MAX });
    expect(ofTen.total).toBe(count((run) => run.summary.carriers === 10));
    expect(ofTen.total).toBeGreaterThanOrEqual(43); // copies i = 3, 6, …, 129
    expect(ofTen.items.every((run) => run.summary.carriers === 10)).toBe(true);
    expect(ofTen.choices.carriers).toEqual(expect.arrayContaining([10, 11, 12]));
    const byOwner = await page({ createdBy: org.people.owner.id });
    expect(byOwner.total).toBe(COPIES);
    expect(byOwner.choices.authors.map((a) => a.id).sort()).toEqual(
      [org.people.engineer.id, org.people.owner.id].sort(),
    );
    const maxTakt = 3600 / 112 + 1e-9;
    const fast = await page({ minThroughput: 112, maxTakt, limit: RUNS_PAGE_MAX });
    expect(fast.total).toBe(
      count((run) => run.summary.throughputPerHour.mean >= 112 && run.summary.taktSeconds.mean <= maxTakt),
    );
    expect(fast.total).toBeGreaterThanOrEqual(10); // copies with i % 13 = 12
    const since = await page({ since: new Date(Date.now() - 60 * 60_000).toISOString() });
    expect(since.total).toBeGreaterThan(0);
    expect(since.total).toBeLessThan(TOTAL);
  });

  it('an offset past the end answers an empty page with the total; the deepest allowed offset works', async () => {
    const past = await page({ offset: TOTAL });
    expect(past.items).toEqual([]);
    expect(past.total).toBe(TOTAL);
    expect((await page({ offset: RUNS_OFFSET_MAX })).items).toEqual([]);
  });

  it.each([
    [{ limit: RUNS_PAGE_MAX + 1 }, 'limit', `must be at most ${RUNS_PAGE_MAX}`],
    [{ limit: 0 }, 'limit', 'must be at least 1'],
    [{ limit: 2.5 }, 'limit', 'must be a whole number'],
    [{ offset: RUNS_OFFSET_MAX + 1 }, 'offset', `must be at most ${RUNS_OFFSET_MAX}`],
    [{ offset: -1 }, 'offset', 'must be at least 0'],
    [{ sort: 'results' }, 'sort', expect.stringMatching(/^must be one of name/)],
    [{ order: 'sideways' }, 'order', 'must be asc or desc'],
    [{ carriers: 'many' }, 'carriers', 'must be a number'],
    [{ since: 'yesterday' }, 'since', expect.stringMatching(/^must be a date and time/)],
    [{ createdBy: 'someone' }, 'createdBy', 'must be a user id or "former"'],
  ])('%o answers 400 naming %s', async (query, path, message) => {
    await seedRuns();
    const res = await org.people.viewer.agent.get(apiRoutes.projectRuns(org.content.projectId)).query(query);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path, message }]);
  });

  it('a scenario’s list pages the same way', async () => {
    await seedRuns();
    const res = await org.people.viewer.agent
      .get(apiRoutes.scenarioRuns(org.content.scenarioId))
      .query({ limit: 7, offset: 7, sort: 'name', order: 'asc' });
    expect(res.status).toBe(200);
    const body = runsPageSchema.parse(res.body);
    expect(body.items).toHaveLength(7);
    expect(body.total).toBe(TOTAL);
  });
});
