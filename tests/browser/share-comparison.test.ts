// An engineer makes a read-only link to a comparison of two runs on the compare page; a visitor without an
// account opens it and sees the comparison's answer and headline figures, told it is a shared view, with
// no control that changes or shares anything and no price list; once withdrawn the link shows nothing.
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { ComparisonEntity, ShareLinkEntity } from '../../server/db/entities';
import { DEMO_PASSWORD } from '../../server/db/seed/demo';
import { runBody } from '../api/fixtures/world';
import { screenshot, useAppInBrowser, type TestApp } from '../support/browser';
import { DEMO_ENGINEER, demoEngineerAgent, firstDemoScenario } from './support/demo-engineer';

let comparePath: string;
let runIds: string[];
let shareUrl: string;

const session = useAppInBrowser(async (app) => {
  // Two stored runs of the demo's first scenario, saved through the API as the engineer.
  const engineer = await demoEngineerAgent(app);
  const scenario = await firstDemoScenario(app);
  runIds = [];
  for (let i = 0; i < 2; i++) {
    const saved = await engineer.post(`/api/scenarios/${scenario.id}/runs`).send(runBody(scenario.latestRevisionId!));
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    runIds.push(saved.body.id);
  }
  comparePath = `/projects/${scenario.projectId}/compare?runs=${runIds.join(',')}`;
});
let page: Page;
let app: TestApp;

beforeAll(() => {
  ({ page, app } = session);
});

describe('sharing a comparison read-only', () => {
  it('the engineer makes a link on the compare page', async () => {
    await page.goto(`${app.url}/sign-in?returnTo=${encodeURIComponent(comparePath)}`);
    await page.getByLabel('E-mail').fill(DEMO_ENGINEER);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByTestId('answer').waitFor();
    const panel = page.getByRole('region', { name: 'Share read-only' });
    await panel.getByRole('button', { name: 'Make a link' }).click();
    shareUrl = await panel.getByLabel('Share link').inputValue();
    expect(shareUrl).toMatch(/\/shared#[A-Za-z0-9_-]{43}$/);
    await panel.getByRole('table', { name: 'Share links' }).getByText('Demo Engineer').first().waitFor();
    expect(await panel.textContent()).toContain("this comparison's results");
    await panel.screenshot({
      path: await screenshot(page, 'share-comparison-01-made').then((p) => p.replace('.png', '-panel.png')),
    });
    const stored = await app.dataSource.getRepository(ComparisonEntity).findOneByOrFail({ runKey: runIds.join(',') });
    expect(stored.runIds).toEqual(runIds);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
  });

  it('a visitor without an account sees the comparison, marked as a shared view, with nothing to change', async () => {
    await page.goto(shareUrl);
    await page.getByRole('note', { name: 'Shared view' }).waitFor();
    await page.getByRole('heading', { level: 1, name: 'Compared layouts' }).waitFor();
    await page.getByTestId('answer').waitFor();
    const main = page.locator('main');
    const text = (await main.textContent()) ?? '';
    expect(text).toContain('Shared view, read only');
    expect(text).not.toContain('Demo Engineer');
    // The team's prices stay behind: the answer says so rather than that no price list exists.
    expect(await page.getByTestId('answer').textContent()).toContain("leaves the team's prices out");
    // Table sorting and the exports change nothing; no control to edit prices or share may be there.
    const buttons = (await main.getByRole('button').allTextContents()).map((t) => t.trim());
    expect(buttons.filter((t) => !/↕|↑|↓|^(CSV|PNG|SVG)/.test(t))).toEqual([]);
    expect(await main.getByRole('region', { name: 'Share read-only' }).count()).toBe(0);
    expect(await main.getByRole('link').count()).toBe(0);
    await screenshot(page, 'share-comparison-02-shared-view');
  });

  it('once withdrawn, the link shows nothing', async () => {
    await app.dataSource.getRepository(ShareLinkEntity).update({ kind: 'comparison' }, { revokedAt: new Date() });
    await page.goto(`${app.url}/`);
    await page.goto(shareUrl);
    await page.getByRole('alert').waitFor();
    expect(await page.getByRole('alert').textContent()).toContain('withdrawn');
    expect(session.browser.pageErrors).toEqual([]);
  });
});
