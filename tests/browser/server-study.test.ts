// The demo engineer sends a carrier-sizing study to the server: picks "The server" under Where it runs,
// follows the progress the server reports while a real study worker (engine threads fed from the queue)
// runs the jobs, and reads the recommendation once the workers finish. The tab plays no part in the work.
import { afterAll, describe, expect, it } from 'vitest';
import { databaseUrlOf } from '../../server/db/data-source';
import { startWorkerProcess, type WorkerProcess } from '../../server/worker/worker-process';
import { screenshot, useAppInBrowser } from '../support/browser';

const DEMO_PROJECT = 'Cartridge line layout study';
const STUDY_TIMEOUT = 240_000;

// A worker process of its own, as `npm run worker` starts it: its engine threads load TypeScript
// through tsx, which the test runner's own threads cannot.
let worker: WorkerProcess | undefined;
const session = useAppInBrowser({
  viewport: { width: 1280, height: 900 },
  prepare: async (app) => {
    worker = await startWorkerProcess(databaseUrlOf(app.dataSource), { LANEWRIGHT_WORKER_THREADS: '2' });
  },
});

afterAll(async () => {
  await worker?.stop();
});

describe('a study on the server’s workers', () => {
  it(
    'runs there with the server’s progress on the page and ends with a recommendation',
    async () => {
      const { page, browser } = session;
      await session.signIn('engineer@demo.lanewright.test');
      await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).click();
      await page.getByRole('link', { name: 'Studies' }).click();
      await page.getByRole('button', { name: 'New study' }).first().click();
      const form = page.getByRole('form', { name: 'New study' });
      await form.getByLabel('Question').selectOption('carrierSizing');
      await expect.poll(() => form.getByLabel('Fewest carriers').inputValue()).not.toBe('1');
      await form.getByLabel('Name', { exact: true }).fill('Carriers, sized on the server');
      await form.getByLabel('Hours per replication').fill('4');
      await form.getByLabel('Warm-up (min)').fill('10');
      await form.getByLabel('Replications').fill('3');
      await form.getByLabel('Counts to try').fill('5');
      await form.getByRole('radio', { name: /The server/ }).check();
      expect(await page.getByTestId('run-place-hint').innerText()).toContain('you chose');
      await form.getByRole('button', { name: 'Make and run the study' }).click();

      await page.getByRole('heading', { level: 1, name: 'Carriers, sized on the server' }).waitFor();
      await page
        .getByText(/on the server’s workers/)
        .first()
        .waitFor();
      await screenshot(page, 'server-study-running');
      await page.getByText(/Status: (Done|Done, some points failed)\./).waitFor({ timeout: STUDY_TIMEOUT });
      const recommendation = page.getByTestId('study-recommendation');
      await recommendation.waitFor();
      expect(await recommendation.innerText()).toMatch(/Recommended: \d+ carriers|No carrier count reaches the target/);
      expect(await page.locator('[data-chart-part="point"]').count()).toBeGreaterThanOrEqual(3);
      await screenshot(page, 'server-study-done');
      expect(browser.pageErrors).toEqual([]);
      expect(browser.consoleErrors).toEqual([]);
    },
    STUDY_TIMEOUT + 60_000,
  );
});
