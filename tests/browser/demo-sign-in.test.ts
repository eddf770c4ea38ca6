import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { screenshot, useAppInBrowser, type TestApp, type TestBrowser } from '../support/browser';

const ENGINEER = 'engineer@demo.lanewright.test';
const PASSWORD = 'demo-password';
const DEMO_PROJECT = 'Cartridge line layout study';
const DEMO_SCENARIOS = ['Stacked loop', 'Side-by-side loop'];

const session = useAppInBrowser();
let app: TestApp;
let browser: TestBrowser;
let page: Page;

beforeAll(() => {
  ({ app, browser, page } = session);
});

const path = () => new URL(page.url()).pathname + new URL(page.url()).search;

async function fillSignIn(email: string, password: string) {
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

describe('demo engineer in the browser', () => {
  it('is sent to sign-in, told plainly about a wrong password, and keeps the typed e-mail', async () => {
    await page.goto(`${app.url}/`);
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
    expect(path()).toBe('/sign-in');
    // A visitor's session check is an ordinary answer: nothing logged as an error, no failed request.
    await page.waitForLoadState('networkidle');
    expect(browser.consoleErrors).toEqual([]);
    await screenshot(page, '01-sign-in');

    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Skip to main content');
    await screenshot(page, '01b-skip-link-focused');
    await page.keyboard.press('Enter');
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('type'))).toBe('email');

    await fillSignIn(ENGINEER, 'not-the-demo-password');
    const alert = page.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toContain('The e-mail or password is incorrect.');
    expect(await page.getByLabel('E-mail').inputValue()).toBe(ENGINEER);
    await screenshot(page, '02-wrong-password');
  });

  it('signs in and sees the demo project with its two scenarios', async () => {
    await fillSignIn(ENGINEER, PASSWORD);
    const projectLink = page.getByRole('link', { name: new RegExp(DEMO_PROJECT) });
    await projectLink.waitFor();
    expect(await page.getByRole('banner').textContent()).toContain('Demo Engineer');
    expect(await projectLink.textContent()).toContain('2 scenarios');
    await screenshot(page, '03-projects');

    await projectLink.click();
    await page.getByRole('heading', { level: 1, name: DEMO_PROJECT }).waitFor();
    for (const name of DEMO_SCENARIOS) await page.getByRole('link', { name: new RegExp(name) }).waitFor();
    await screenshot(page, '04-project');
  });

  it('opens a scenario with its layout, editor and revision history', async () => {
    await page.getByRole('link', { name: /Stacked loop/ }).click();
    await page.getByRole('heading', { level: 1, name: 'Stacked loop' }).waitFor();
    await page.getByRole('table', { name: 'Revision history' }).waitFor();
    expect(await page.getByRole('table', { name: 'Revision history' }).textContent()).toContain('Demo Engineer');
    // The stacked loop is two decks of eight 1000 mm modules each (shared/examples/stacked-loop.json).
    expect(await page.locator('[data-fact="modules"]').textContent()).toBe('16');
    await page
      .getByRole('navigation', { name: 'Scenario sections' })
      .getByRole('button', { name: /^Carriers/ })
      .click();
    expect(await page.getByRole('region', { name: 'Carriers' }).getByLabel('Carrier count').inputValue()).toBe('20');
    await screenshot(page, '05-scenario');

    await page.setViewportSize({ width: 390, height: 844 });
    await screenshot(page, '06-scenario-narrow');
    await page.setViewportSize({ width: 1280, height: 800 });
  });

  it('signs out to the sign-in page, and a signed-out visit to a scenario asks to sign in again', async () => {
    const scenarioPath = path();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
    expect(path()).toBe('/sign-in');
    await screenshot(page, '07-signed-out');

    await page.goto(`${app.url}${scenarioPath}`);
    await page.getByRole('heading', { level: 1, name: 'Sign in to Lanewright' }).waitFor();
    expect(path()).toBe(`/sign-in?returnTo=${encodeURIComponent(scenarioPath)}`);
    expect(browser.pageErrors).toEqual([]);
  });
});
