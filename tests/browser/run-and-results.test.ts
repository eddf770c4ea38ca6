// The demo engineer changes a station's cycle time and saves a new revision, runs it in the browser,
// follows the progress, reads the stored result and finds the run again after a reload; the demo
// viewer reads the same run without any control that changes it. Screenshots go to test-artifacts/screenshots/run-*.png.
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { screenshot, useAppInBrowser, type TestApp, type TestBrowser } from '../support/browser';

const DEMO_PROJECT = 'Cartridge line layout study';
const DEMO_SCENARIO = 'Stacked loop';
const RUN_TIMEOUT = 90_000;

const session = useAppInBrowser({ viewport: { width: 1280, height: 900 } });
let app: TestApp;
let browser: TestBrowser;
let page: Page;
let runPath = '';

beforeAll(() => {
  ({ app, browser, page } = session);
});

async function signIn(email: string) {
  await session.signIn(email);
  await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).waitFor();
}

async function openDemoScenario() {
  await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).click();
  await page.getByRole('link', { name: new RegExp(DEMO_SCENARIO) }).click();
  await page.getByRole('heading', { level: 1, name: DEMO_SCENARIO, exact: true }).waitFor();
}

async function fillSettings(values: Record<string, string>) {
  const form = page.getByRole('form', { name: 'Run settings' });
  for (const [label, value] of Object.entries(values)) await form.getByLabel(label, { exact: true }).fill(value);
}

describe('running the demo scenario as the demo engineer', () => {
  it('cancels a long run at once and saves nothing', async () => {
    await signIn('engineer@demo.lanewright.test');
    await openDemoScenario();
    await fillSettings({ 'Hours simulated': '2000', Replications: '5' });
    await page.getByRole('button', { name: 'Run simulation' }).click();
    const bar = page.getByRole('progressbar', { name: 'Simulation progress' });
    await bar.waitFor();
    await page.getByText(/Replication 1 of 5/).waitFor();
    await page.getByRole('button', { name: 'Cancel run' }).click();
    await page.getByText('The run was cancelled; nothing was saved.').waitFor();
    expect(await bar.count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Run simulation' }).isEnabled()).toBe(true);
  });

  it('changes the press cycle time and saves it as a new revision', async () => {
    await page
      .getByRole('navigation', { name: 'Scenario sections' })
      .getByRole('button', { name: /^Process and stations/ })
      .click();
    await page.getByRole('button', { name: /^Step 2: Press seat ring/ }).click();
    await page.getByRole('button', { name: 'Station PR', exact: true }).click();
    const value = page.locator('[data-distribution$="cycleTimeSeconds"]').getByLabel('Value (s)', { exact: true });
    await value.fill('8.5');
    await page.getByLabel('What changed (optional)').fill('Faster press');
    await page.getByRole('button', { name: 'Save as revision 2' }).click();
    await page.getByText('No unsaved changes').waitFor();
    const history = page.getByRole('table').filter({ hasText: 'Faster press' });
    await history.getByText('#2').waitFor();
    await page.getByRole('heading', { name: 'Run revision 2' }).waitFor();
    await screenshot(page, 'run-00-saved-revision');
  });

  it('runs 5 replications with visible progress, then opens the stored result with both heatmaps', async () => {
    await fillSettings({
      'Hours simulated': '24',
      'Warm-up (minutes)': '10',
      Replications: '5',
      Seed: '2026',
      'Carrier count': '',
    });
    await page.getByRole('button', { name: 'Run simulation' }).click();
    await page.getByText(/Replication [2-5] of 5/).waitFor({ timeout: RUN_TIMEOUT });
    const progress = page.getByRole('progressbar', { name: 'Simulation progress' });
    expect(Number(await progress.getAttribute('aria-valuenow'))).toBeGreaterThan(0);
    expect(await page.getByTestId('simulation-progress').textContent()).toMatch(/Simulated: .+ of 24 h 10 min/);
    await screenshot(page, 'run-01-progress');

    const open = page.getByRole('link', { name: 'Open the results' });
    await open.waitFor({ timeout: RUN_TIMEOUT });
    runPath = (await open.getAttribute('href')) ?? '';
    expect(runPath).toMatch(/^\/runs\/[0-9a-f-]{36}$/);
    await page
      .getByRole('table', { name: 'Runs of this scenario' })
      .locator(`tr[data-run-id="${runPath.split('/').pop()}"]`)
      .waitFor();
    await open.click();
    await page.waitForURL((url) => url.pathname === runPath);
    await page.getByRole('heading', { name: 'Headline' }).waitFor();
    for (const chart of ['space-time', 'station-timeline']) {
      const frame = page.locator(`[data-chart$="-${chart}"]`);
      await frame.locator('svg[role="img"]').waitFor();
      expect(await frame.locator('[data-chart-state]').count()).toBe(0);
    }
    expect(await page.locator('[data-verdict]').textContent()).toMatch(/(Meets|Misses) the target takt of 10\.00 s/);
    expect(await page.getByText('Seed', { exact: true }).locator('xpath=following-sibling::dd').textContent()).toBe(
      '2026',
    );
    expect(await page.getByRole('complementary', { name: 'Safety caution' }).textContent()).toContain(
      'not a safety sign-off',
    );
    await screenshot(page, 'run-02-result');
  });

  it('finds the run again after a reload, on the result page and in the project’s and scenario’s runs tables', async () => {
    const runId = runPath.split('/').pop() ?? '';
    await page.reload();
    await page.getByRole('heading', { name: 'Headline' }).waitFor();
    const runName = await page.getByRole('heading', { level: 1 }).textContent();

    await page.getByRole('link', { name: `Runs of ${DEMO_PROJECT}` }).click();
    await page.getByRole('heading', { level: 1, name: `Runs of ${DEMO_PROJECT}` }).waitFor();
    await page.reload();
    const projectTable = page.getByRole('table', { name: 'Runs in this project' });
    await projectTable.waitFor();
    const projectRow = projectTable.locator(`tr[data-run-id="${runId}"]`);
    expect(await projectRow.getByRole('link').first().textContent()).toBe(runName);
    expect(await projectRow.textContent()).toContain(DEMO_SCENARIO);
    await screenshot(page, 'run-03-project-runs');

    await projectRow.getByRole('link').first().click();
    await page.getByRole('heading', { name: 'Headline' }).waitFor();
    await page.getByRole('link', { name: DEMO_SCENARIO, exact: true }).click();
    await page.getByRole('heading', { level: 1, name: DEMO_SCENARIO, exact: true }).waitFor();
    const row = page.getByRole('table', { name: 'Runs of this scenario' }).locator(`tr[data-run-id="${runId}"]`);
    await row.waitFor();
    expect(await row.textContent()).toContain('#2');
    await row.scrollIntoViewIfNeeded();
    await screenshot(page, 'run-04-scenario-runs');

    await page.goto(`${app.url}${runPath}`);
    await page.getByRole('heading', { name: 'Headline' }).waitFor();
    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, 'run-05-result-narrow');
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
  });
});

describe('the demo viewer', () => {
  it('reads the run with no control that changes it', async () => {
    await signIn('viewer@demo.lanewright.test');
    await page.goto(`${app.url}${runPath}`);
    await page.getByRole('heading', { name: 'Headline' }).waitFor();
    await page.locator('[data-chart$="-space-time"] svg[role="img"]').waitFor();
    for (const name of [/^Delete/, /^Rename/, /^Rerun/])
      expect(await page.getByRole('button', { name }).count()).toBe(0);
    await screenshot(page, 'run-06-viewer-result');

    await page.getByRole('link', { name: DEMO_SCENARIO, exact: true }).click();
    await page.getByRole('heading', { level: 1, name: DEMO_SCENARIO, exact: true }).waitFor();
    await page.getByRole('table', { name: 'Runs of this scenario' }).waitFor();
    expect(await page.getByRole('button', { name: 'Run simulation' }).count()).toBe(0);
    for (const name of [/^Delete/, /^Rename/, /^Rerun/, /^Save as revision/, /^Restore/])
      expect(await page.getByRole('button', { name }).count()).toBe(0);
    await screenshot(page, 'run-07-viewer-scenario');
    expect(browser.pageErrors).toEqual([]);
  });
});
