// The demo engineer runs a short experiment, opens its playback from the result page, records a
// window, plays it, pauses and scrubs: carriers are painted on the decks and in the side elevation
// and move, the clock and the moment in words follow. Screenshots go to test-artifacts/screenshots/playback-*.png.
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { screenshot, useAppInBrowser, type TestApp, type TestBrowser } from '../support/browser';

const RUN_TIMEOUT = 90_000;

const session = useAppInBrowser({ viewport: { width: 1280, height: 900 } });
let app: TestApp;
let browser: TestBrowser;
let page: Page;

beforeAll(() => {
  ({ app, browser, page } = session);
});

/** Where every carrier is, from the table of the shown moment, keyed by carrier number. */
async function placements(): Promise<Map<string, string>> {
  const rows = await page
    .locator('[data-playback-carrier]')
    .evaluateAll((els) =>
      els.map((el) => [el.getAttribute('data-playback-carrier') ?? '', el.textContent ?? ''] as const),
    );
  return new Map(rows);
}

/** Per overlay canvas (deck plans, then the side elevation): how many pixels are painted, and the picture. */
async function pictures(): Promise<{ view: string; painted: number; picture: string }[]> {
  return page.locator('canvas[data-region]').evaluateAll((els) =>
    (els as HTMLCanvasElement[]).map((canvas) => {
      const pixels = canvas.getContext('2d')?.getImageData(0, 0, canvas.width, canvas.height).data ?? [];
      let painted = 0;
      for (let i = 3; i < pixels.length; i += 4) if (pixels[i] > 0) painted++;
      return { view: canvas.dataset.overlayDeck ?? 'side', painted, picture: canvas.toDataURL() };
    }),
  );
}

/** Waits until the tables describe the moment the clock shows (they follow a scrub after a short rest). */
async function settled(): Promise<string> {
  const shown = (await clock()) ?? '';
  await page.getByText(`Every carrier and station at ${shown}`).waitFor();
  return shown;
}

const clock = () => page.locator('[data-playback-clock]').textContent();
const seconds = (hms: string | null) => (hms ?? '').split(':').reduce((sum, part) => sum * 60 + Number(part), 0);

describe('playback of a stored run', () => {
  it('records a window of the run from the result page', async () => {
    await session.signIn('engineer@demo.lanewright.test');
    await page.getByRole('link', { name: /Cartridge line layout study/ }).click();
    await page
      .getByRole('link', { name: /Stacked loop/ })
      .first()
      .click();
    const form = page.getByRole('form', { name: 'Run settings' });
    await form.getByLabel('Hours simulated', { exact: true }).fill('1');
    await form.getByLabel('Warm-up (minutes)', { exact: true }).fill('10');
    await form.getByLabel('Replications', { exact: true }).fill('2');
    await page.getByRole('button', { name: 'Run simulation' }).click();
    await page.getByRole('link', { name: 'Open the results' }).click({ timeout: RUN_TIMEOUT });
    await page.getByRole('link', { name: 'Watch the line run' }).click();
    await page.getByRole('heading', { level: 1, name: /^Playback of / }).waitFor();

    await page.getByLabel('Replication', { exact: true }).fill('3');
    await page.getByRole('button', { name: 'Record window' }).click();
    await page.getByText('Replication must be from 1 to 2').waitFor();

    await page.getByLabel('Replication', { exact: true }).fill('2');
    await page.getByLabel('Start (minutes)').fill('12,5');
    await page.getByLabel('Length (minutes)').fill('20');
    await page.getByRole('button', { name: 'Record window' }).click();
    await page.locator('[data-playback]').waitFor({ timeout: RUN_TIMEOUT });
    expect(await clock()).toBe('0:12:30');
    expect(await settled()).toBe('0:12:30');
    const shown = await placements();
    expect(shown.size).toBeGreaterThan(0);
    // The moment in words: every carrier counted, and the stations' states.
    expect(await page.locator('[data-playback-summary]').textContent()).toMatch(
      new RegExp(
        `^${shown.size} carriers on the track: \\d+ moving, \\d+ standing, \\d+ with a part\\. Stations: .*(processing|starved|blocked)`,
      ),
    );
    expect([...shown.values()].every((row) => /lane|transfer|elevator|link|curve/.test(row))).toBe(true);
    expect(
      await page.locator('[data-playback-station]').filter({ hasNotText: 'not known yet' }).count(),
    ).toBeGreaterThan(0);
    // Carriers and station rings are painted on more than one deck of the stacked loop, and in the side elevation.
    const painted = await pictures();
    expect(painted.filter((p) => p.view !== 'side' && p.painted > 0).length).toBeGreaterThan(1);
    expect(painted.find((p) => p.view === 'side')?.painted ?? 0).toBeGreaterThan(0);
    await screenshot(page, 'playback-00-recorded');
  });

  it('plays: the clock runs and carriers move, then pauses', async () => {
    const before = await placements();
    const beforePictures = await pictures();
    const started = seconds(await clock());
    await page.locator('[data-playback-speed]').selectOption('100');
    await page.getByRole('button', { name: 'Play' }).click();
    await page.waitForTimeout(1500);
    await screenshot(page, 'playback-01-playing');
    await page.getByRole('button', { name: 'Pause' }).click();
    const paused = seconds(await settled());
    expect(paused - started).toBeGreaterThan(60);
    const after = await placements();
    const moved = [...after].filter(([c, place]) => before.has(c) && before.get(c) !== place);
    expect(moved.length).toBeGreaterThan(0);
    const redrawn = (await pictures()).filter((p, i) => p.picture !== beforePictures[i]?.picture);
    expect(redrawn.length).toBeGreaterThan(0);
    await page.waitForTimeout(400);
    expect(seconds(await clock())).toBe(paused);
  });

  it('scrubs to any moment of the window and back to its start', async () => {
    const scrubber = page.locator('[data-playback-scrubber]');
    const start = Number(await scrubber.getAttribute('min'));
    const end = Number(await scrubber.getAttribute('max'));
    expect(end - start).toBe(20 * 60);
    const atStart = async () => {
      await scrubber.fill(String(start));
      await settled();
      return { rows: await placements(), pictures: (await pictures()).map((p) => p.picture) };
    };
    const first = await atStart();
    await scrubber.fill(String(end - 60));
    expect(seconds(await clock())).toBe(end - 60);
    await screenshot(page, 'playback-02-scrubbed');
    expect(await atStart()).toEqual(first);
    expect(browser.pageErrors).toEqual([]);
  });

  it('on a 390 px phone: no page scrolls sideways, and the drawings keep a legible size in their own scrolling box', async () => {
    const playbackPath = new URL(page.url()).pathname;
    const runPath = playbackPath.replace(/\/playback$/, '');
    const scenarioPath = await page.getByRole('link', { name: 'Stacked loop' }).first().getAttribute('href');
    await page.setViewportSize({ width: 390, height: 844 });
    for (const [name, path] of [
      ['scenario', scenarioPath ?? ''],
      ['result', runPath],
      ['playback', playbackPath],
    ] as const) {
      await page.goto(`${app.url}${path}`);
      await page.locator('main h1').waitFor();
      await page.waitForTimeout(1500);
      expect(await page.evaluate(() => document.documentElement.scrollWidth), name).toBeLessThanOrEqual(390);
      await screenshot(page, `playback-phone-${name}`);
    }
    await page.goto(`${app.url}${scenarioPath}`);
    const plan = page.locator('[data-drawing-scroll] svg').first();
    expect((await plan.boundingBox())?.width ?? 0).toBeGreaterThanOrEqual(640);
    // The editor's sections sit in a row above the section, not in a side column.
    const nav = await page.getByRole('navigation', { name: 'Scenario sections' }).boundingBox();
    const region = await page.getByRole('region', { name: 'General' }).boundingBox();
    expect(region?.y ?? 0).toBeGreaterThan((nav?.y ?? 0) + (nav?.height ?? 0) - 1);
  });
});
