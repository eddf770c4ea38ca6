// An engineer makes a read-only link to a run; a visitor without an account opens it and sees the results,
// told it is a shared view, with no control that changes anything; once withdrawn the link shows nothing.
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { runBody } from '../api/fixtures/world';
import { screenshot, useAppInBrowser, type TestApp } from '../support/browser';
import { demoEngineerAgent, firstDemoScenario } from './support/demo-engineer';

let runId: string;
let shareUrl: string;

const session = useAppInBrowser({
  prepare: async (app) => {
    // A stored run of the demo's first scenario, saved through the API as the engineer.
    const engineer = await demoEngineerAgent(app);
    const scenario = await firstDemoScenario(app);
    const saved = await engineer.post(`/api/scenarios/${scenario.id}/runs`).send(runBody(scenario.latestRevisionId!));
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    runId = saved.body.id;
  },
});
let page: Page;
let app: TestApp;

beforeAll(() => {
  ({ page, app } = session);
});

describe('sharing a run read-only', () => {
  it('the engineer makes a link on the run page', async () => {
    await session.signIn('engineer@demo.lanewright.test', { returnTo: `/runs/${runId}` });
    const panel = page.getByRole('region', { name: 'Share read-only' });
    await panel.waitFor();
    await panel.getByRole('button', { name: 'Make a link' }).click();
    shareUrl = await panel.getByLabel('Share link').inputValue();
    expect(shareUrl).toMatch(/\/shared#[A-Za-z0-9_-]{43}$/);
    await panel.getByRole('table', { name: 'Share links' }).getByText('Demo Engineer').first().waitFor();
    await panel.screenshot({
      path: await screenshot(page, 'share-01-made').then((p) => p.replace('.png', '-panel.png')),
    });
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
  });

  it('a visitor without an account sees the results, marked as a shared view, with nothing to change', async () => {
    await page.goto(shareUrl);
    await page.getByRole('note', { name: 'Shared view' }).waitFor();
    await page.getByRole('heading', { level: 1 }).waitFor();
    const main = page.locator('main');
    expect(await main.textContent()).toContain('Shared view, read only');
    // Table sorting and the exports (CSV, PNG, SVG) change nothing; no other control may be there.
    const buttons = (await main.getByRole('button').allTextContents()).map((text) => text.trim());
    expect(buttons.filter((text) => !/↕|↑|↓|^(CSV|PNG|SVG)/.test(text))).toEqual([]);
    expect(await main.getByRole('link', { name: /revision/i }).count()).toBe(0);
    expect(
      await page.getByRole('navigation', { name: 'Team and account' }).getByRole('link', { name: 'Members' }).count(),
    ).toBe(0);
    await screenshot(page, 'share-02-shared-view');
    await page.screenshot({ path: (await screenshot(page, 'share-02-shared-view')).replace('.png', '-top.png') });
  });

  it('once withdrawn, the link shows nothing', async () => {
    await app.dataSource.getRepository('ShareLinkEntity').update({ subjectId: runId }, { revokedAt: new Date() });
    await page.goto(`${app.url}/`);
    await page.goto(shareUrl);
    await page.getByRole('alert').waitFor();
    expect(await page.getByRole('alert').textContent()).toContain('withdrawn');
    expect(session.browser.pageErrors).toEqual([]);
  });
});
