// The longest run the settings allow, made the way a user makes it: each example layout becomes a scenario
// through the New scenario form, runs 8,760 h × 1 replication in the browser's engine workers, and is
// saved. Its stored rate must lie inside the 95 % interval of 20 eight-hour replications of the same
// layout, run here in Node by the same engine. Two tabs run at once so both cores work.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { RunDetail } from '../../shared/api/runs';
import { RUN_LIMITS } from '../../shared/scenario/run-settings';
import { runExperiment } from '../../workers/engine';
import { EXAMPLES_DIR, exampleFiles } from '../engine/helpers';
import { screenshot, useAppInBrowser } from '../support/browser';

const DEMO_PROJECT = 'Cartridge line layout study';
const YEAR_TIMEOUT = 900_000;
const WARMUP_MINUTES = '30';
const VIEWPORT = { width: 1280, height: 900 };

const session = useAppInBrowser({ viewport: VIEWPORT });

interface Example {
  file: string;
  name: string;
  document: unknown;
}

function examples(): Example[] {
  return exampleFiles().map((file) => {
    const document = JSON.parse(readFileSync(join(EXAMPLES_DIR, file), 'utf8')) as { name: string };
    return { file, name: document.name, document };
  });
}

/** A project of its own, so the demo project's scenario list stays as other tests expect it. */
async function createProject(page: Page): Promise<string> {
  await page.getByRole('button', { name: 'New project' }).click();
  await page.getByRole('form', { name: 'New project' }).getByLabel('Project name').fill('Year-long runs');
  await page.getByRole('button', { name: 'Create project' }).click();
  await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/);
  return page.url();
}

/** Makes the example a scenario through the form, runs a year, returns the saved run. */
async function runAYear(page: Page, projectUrl: string, example: Example, index: number): Promise<RunDetail> {
  await page.goto(projectUrl);
  await page.getByRole('button', { name: 'New scenario' }).first().click();
  const form = page.getByRole('form', { name: 'New scenario' });
  await form.getByLabel('Start from').selectOption({ label: example.name });
  await form.getByLabel('Scenario name').fill(`A year of ${example.name}`);
  await form.getByRole('button', { name: 'Create scenario' }).click();
  await page.getByRole('heading', { level: 1, name: `A year of ${example.name}`, exact: true }).waitFor();

  const settings = page.getByRole('form', { name: 'Run settings' });
  await settings.getByLabel('Hours simulated', { exact: true }).fill(String(RUN_LIMITS.hoursMax));
  await settings.getByLabel('Warm-up (minutes)', { exact: true }).fill(WARMUP_MINUTES);
  await settings.getByLabel('Replications', { exact: true }).fill('1');
  await settings.getByLabel('Seed', { exact: true }).fill(String(1000 + index));
  await page.getByRole('button', { name: 'Run simulation' }).click();
  await page.getByRole('progressbar', { name: 'Simulation progress' }).waitFor();
  const open = page.getByRole('link', { name: 'Open the results' });
  await open.waitFor({ timeout: YEAR_TIMEOUT });
  const runId = ((await open.getAttribute('href')) ?? '').split('/').pop();
  if (index === 0) await screenshot(page, 'year-run-saved');
  const response = await page.request.get(`${session.app.url}/api/runs/${runId}`);
  expect(response.status(), example.file).toBe(200);
  return (await response.json()) as RunDetail;
}

describe('a year of simulated time in the browser', () => {
  it(
    'every example runs 8,760 h × 1 replication from the scenario page, is saved, and agrees with its 8-h rate',
    async () => {
      const list = examples();
      const { browser } = session;
      const second = await browser.context.newPage();
      await second.setViewportSize(VIEWPORT);
      const pages = [browser.page, second];
      await session.signIn('engineer@demo.lanewright.test');
      await browser.page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).waitFor();
      const projectUrl = await createProject(pages[0]);

      const runs = new Array<RunDetail>(list.length);
      let next = 0;
      await Promise.all(
        pages.map(async (page) => {
          while (next < list.length) {
            const i = next++;
            runs[i] = await runAYear(page, projectUrl, list[i], i);
          }
        }),
      );

      for (const [i, example] of list.entries()) {
        const shift = await runExperiment(
          example.document,
          { hours: 8, replications: 20, warmupMinutes: Number(WARMUP_MINUTES) },
          { now: () => performance.now(), yieldToHost: async () => undefined },
        );
        const year = runs[i].results;
        expect(year.observedHours, example.file).toBe(RUN_LIMITS.hoursMax);
        expect(year.throughputPerHour.mean, example.file).toBeGreaterThanOrEqual(shift.throughputPerHour.ciLow);
        expect(year.throughputPerHour.mean, example.file).toBeLessThanOrEqual(shift.throughputPerHour.ciHigh);
      }
      expect(browser.pageErrors).toEqual([]);
      expect(browser.consoleErrors).toEqual([]);
    },
    YEAR_TIMEOUT * 2,
  );
});
