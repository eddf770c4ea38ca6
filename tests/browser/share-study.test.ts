// An engineer makes a read-only link to a study on its page; a visitor without an account opens it and
// sees the study's answer and points, told it is a shared view, with no control that changes or runs
// anything; once withdrawn the link shows nothing.
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { ScenarioRevisionEntity, ShareLinkEntity } from '../../server/db/entities';
import { DEMO_PASSWORD } from '../../server/db/seed/demo';
import { blockToJson, runReplicationRange } from '../../workers/engine';
import { screenshot, useAppInBrowser, type TestApp } from '../support/browser';
import { DEMO_ENGINEER, demoEngineerAgent, firstDemoScenario } from './support/demo-engineer';

const STUDY_NAME = 'Fleet size for the shared view';
const SETTINGS = { hours: 0.1, warmupMinutes: 1, replications: 1, seed: 11 };
let studyId: string;
let shareUrl: string;

const session = useAppInBrowser(async (app) => {
  // A finished two-point study of the demo's first scenario, its job results from the real engine.
  const engineer = await demoEngineerAgent(app);
  const scenario = await firstDemoScenario(app);
  const revision = await app.dataSource
    .getRepository(ScenarioRevisionEntity)
    .findOneByOrFail({ id: scenario.latestRevisionId! });
  const document = revision.document as { carriers: { count: number } };
  const counts = [document.carriers.count, document.carriers.count - 1];
  const created = await engineer.post(`/api/projects/${scenario.projectId}/studies`).send({
    name: STUDY_NAME,
    kind: 'carrierSizing',
    revisionId: revision.id,
    settings: SETTINGS,
    blockSize: 1,
    points: counts.map((n) => ({ label: `${n} carriers`, changes: [{ path: 'carriers.count', op: 'set', value: n }] })),
  });
  expect(created.status, JSON.stringify(created.body).slice(0, 300)).toBe(201);
  studyId = created.body.id;
  for (const [pointIndex, count] of counts.entries()) {
    const doc = { ...document, carriers: { ...document.carriers, count } };
    const block = blockToJson(await runReplicationRange(doc, SETTINGS, { first: 0, count: 1 }));
    const saved = await engineer.post(`/api/studies/${studyId}/results`).send({
      pointIndex,
      first: 0,
      count: 1,
      outcome: 'done',
      engineVersion: 'test',
      summaries: block.summaries,
      series: block.series,
      events: block.events,
    });
    expect(saved.status, JSON.stringify(saved.body).slice(0, 300)).toBe(201);
  }
});
let page: Page;
let app: TestApp;

beforeAll(() => {
  ({ page, app } = session);
});

describe('sharing a study read-only', () => {
  it('the engineer makes a link on the study page', async () => {
    await page.goto(`${app.url}/sign-in?returnTo=${encodeURIComponent(`/studies/${studyId}`)}`);
    await page.getByLabel('E-mail').fill(DEMO_ENGINEER);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1, name: STUDY_NAME }).waitFor();
    const panel = page.getByRole('region', { name: 'Share read-only' });
    await panel.getByRole('button', { name: 'Make a link' }).click();
    shareUrl = await panel.getByLabel('Share link').inputValue();
    expect(shareUrl).toMatch(/\/shared#[A-Za-z0-9_-]{43}$/);
    await panel.getByRole('table', { name: 'Share links' }).getByText('Demo Engineer').first().waitFor();
    await screenshot(page, 'share-study-01-made');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
  });

  it('a visitor without an account sees the study, marked as a shared view, with nothing to change', async () => {
    await page.goto(shareUrl);
    await page.getByRole('note', { name: 'Shared view' }).waitFor();
    await page.getByRole('heading', { level: 1, name: STUDY_NAME }).waitFor();
    await page.getByRole('heading', { level: 2, name: 'Points' }).waitFor();
    const main = page.locator('main');
    const text = (await main.textContent()) ?? '';
    expect(text).toContain('Shared view, read only');
    expect(text).toContain('carriers');
    // Table sorting and the exports change nothing; no control to run, cancel, resume or share may be there.
    const buttons = (await main.getByRole('button').allTextContents()).map((t) => t.trim());
    expect(buttons.filter((t) => !/↕|↑|↓|^(CSV|PNG|SVG)/.test(t))).toEqual([]);
    expect(await main.getByRole('region', { name: 'Share read-only' }).count()).toBe(0);
    expect(await main.getByRole('link').count()).toBe(0);
    await screenshot(page, 'share-study-02-shared-view');
  });

  it('once withdrawn, the link shows nothing', async () => {
    await app.dataSource.getRepository(ShareLinkEntity).update({ subjectId: studyId }, { revokedAt: new Date() });
    await page.goto(`${app.url}/`);
    await page.goto(shareUrl);
    await page.getByRole('alert').waitFor();
    expect(await page.getByRole('alert').textContent()).toContain('withdrawn');
    expect(session.browser.pageErrors).toEqual([]);
  });
});
