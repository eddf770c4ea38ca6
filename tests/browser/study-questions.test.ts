// The demo engineer asks the other study questions and compares layouts through their studies:
// a sweep of the stacked line's elevator handling time, a speed-up ranking of the side-by-side line,
// then a carrier sizing of each layout with one seed, compared on one chart with paired differences
// and printed as a report. Screenshots go to test-artifacts/screenshots/questions-*.png.
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { projectRoot } from '../../server/setup/paths';
import { screenshot, useAppInBrowser } from '../support/browser';
import { pdfText } from '../support/pdf-text';

const DEMO_PROJECT = 'Cartridge line layout study';
const STUDY_TIMEOUT = 180_000;
const session = useAppInBrowser();

async function openNewStudyForm() {
  const { page } = session;
  await page.goto(`${session.app.url}/`);
  await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).click();
  await page.getByRole('link', { name: 'Studies' }).click();
  await page.getByRole('button', { name: 'New study' }).click();
  return page.getByRole('form', { name: 'New study' });
}

/** Fills the settings every study here shares: short runs, one seed (common random numbers). */
async function fillSettings(form: ReturnType<typeof session.page.getByRole>, name: string) {
  await form.getByLabel('Name', { exact: true }).fill(name);
  await form.getByLabel('Hours per replication').fill('2');
  await form.getByLabel('Warm-up (min)').fill('10');
  await form.getByLabel('Replications').fill('3');
  await form.getByLabel('Seed').fill('5');
}

async function makeAndFinish(form: ReturnType<typeof session.page.getByRole>, name: string) {
  const { page } = session;
  await form.getByRole('button', { name: 'Make and run the study' }).click();
  await page.getByRole('heading', { level: 1, name }).waitFor();
  await page.getByRole('progressbar', { name: 'Study progress' }).waitFor();
  await page.getByText(/Status: (Done|Done, some points failed)\./).waitFor({ timeout: STUDY_TIMEOUT });
  return page.url();
}

describe('study questions of the demo', () => {
  it(
    'signs in as the demo engineer',
    async () => {
      const { page } = session;
      await page.goto(`${session.app.url}/sign-in`);
      await page.getByLabel('E-mail').fill('engineer@demo.lanewright.test');
      await page.getByLabel('Password').fill('demo-password');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).waitFor();
    },
    STUDY_TIMEOUT,
  );

  it(
    'a sweep of the stacked elevators’ handling time draws throughput falling as handling grows',
    async () => {
      const { page } = session;
      const form = await openNewStudyForm();
      await form.getByLabel('Scenario').selectOption({ label: 'Stacked loop (revision 1)' });
      await form.getByLabel('Question').selectOption('sweep');
      await form.getByLabel('Field', { exact: true }).selectOption('transfers.0.handlingSeconds');
      await form.getByRole('combobox', { name: 'Values', exact: true }).selectOption('list');
      await form.getByLabel('Values, separated by commas').fill('1, 2, 4, 6');
      await fillSettings(form, 'Elevator handling');
      await screenshot(page, 'questions-sweep-form');
      await makeAndFinish(form, 'Elevator handling');

      const chart = page.locator('[data-chart="sweep-throughput"]');
      await chart.waitFor();
      await expect.poll(() => chart.locator('[data-chart-part="point"]').count()).toBe(4);
      const rows = page.locator('tr[data-point-state="done"]');
      expect(await rows.count()).toBe(4);
      // The point table reads "mean ± half-width" per handling time, in the order swept.
      const means = (await rows.locator('td:nth-child(3)').allInnerTexts()).map((t) => Number(t.split('±')[0]));
      // An 8 s elevator round trip holds the stacked line back: 6 s handling makes clearly less than 1 s.
      expect(means[3]).toBeLessThan(means[0] * 0.9);
      await screenshot(page, 'questions-sweep-done');
      expect(session.browser.pageErrors).toEqual([]);
    },
    STUDY_TIMEOUT * 2,
  );

  it(
    'a speed-up ranking of the side-by-side line names the press, its bottleneck',
    async () => {
      const { page } = session;
      const form = await openNewStudyForm();
      await form.getByLabel('Scenario').selectOption({ label: 'Side-by-side loop (revision 1)' });
      await form.getByLabel('Question').selectOption('whatIf');
      await fillSettings(form, 'Which station to speed up');
      await makeAndFinish(form, 'Which station to speed up');

      const recommendation = page.getByTestId('study-recommendation');
      await recommendation.waitFor();
      expect(await recommendation.innerText()).toMatch(/Worth speeding up: Servo press/);
      await page.locator('[data-chart="speed-up-ranking"]').waitFor();
      await screenshot(page, 'questions-what-if-done');
      expect(session.browser.pageErrors).toEqual([]);
    },
    STUDY_TIMEOUT * 2,
  );

  it(
    'compares the carrier sizing of both layouts on one chart with paired differences',
    async () => {
      const { page } = session;
      for (const layout of ['Stacked loop', 'Side-by-side loop']) {
        const form = await openNewStudyForm();
        await form.getByLabel('Scenario').selectOption({ label: `${layout} (revision 1)` });
        await form.getByLabel('Question').selectOption('carrierSizing');
        await expect.poll(() => form.getByLabel('Fewest carriers').inputValue()).not.toBe('1');
        // The top of the default range stays below gridlock: one fewer than the loop holds.
        expect(await form.getByLabel('Most carriers').inputValue()).toBe('81');
        await form.getByLabel('Counts to try').fill('4');
        await fillSettings(form, `Fleet of the ${layout.toLowerCase()}`);
        await makeAndFinish(form, `Fleet of the ${layout.toLowerCase()}`);
      }

      await page.getByRole('link', { name: /All studies/ }).click();
      await page.getByRole('link', { name: 'Compare studies' }).click();
      const picker = page.getByRole('form', { name: 'Compare studies' });
      await picker.getByLabel(/Fleet of the stacked loop/).check();
      await picker.getByLabel(/Fleet of the side-by-side loop/).check();
      await picker.getByRole('button', { name: 'Compare chosen studies' }).click();
      await page.getByTestId('study-comparison').waitFor();

      const chart = page.locator('[data-chart="study-comparison-throughput"]');
      await chart.waitFor();
      expect(await chart.locator('[data-series-index]').count()).toBe(2);
      expect(await chart.locator('[data-chart-part="point"]').count()).toBe(8);
      expect(await page.getByTestId('study-pairing').innerText()).toMatch(/Every difference is paired/);
      const answer = await page.getByTestId('study-answer').innerText();
      expect(answer).toMatch(/Side-by-side loop makes significantly more than Stacked loop at [1-4][,;]/);
      expect(answer).toMatch(/95 % paired interval/);
      expect(await page.getByTestId('study-advice').innerText()).toMatch(/Stacked loop: .*Side-by-side loop: /s);
      expect(await page.locator('[data-verdict="significant"]').count()).toBeGreaterThan(0);
      await screenshot(page, 'questions-compare-studies');

      await page.getByRole('link', { name: 'Printable report' }).click();
      await page.locator('[data-testid="report"][data-ready="yes"]').waitFor();
      await page.locator('[data-chart="study-comparison-throughput"]').waitFor();
      await page.emulateMedia({ media: 'print' });
      const pdf = await page.pdf({ format: 'A4', printBackground: false, preferCSSPageSize: true });
      await page.emulateMedia({ media: 'screen' });
      await writeFile(join(projectRoot, 'test-artifacts', 'screenshots', 'questions-compare-studies.pdf'), pdf);
      const { pages, text } = await pdfText(new Uint8Array(pdf));
      const all = text.join('\n').replace(/\s+/g, ' ');
      expect(all).toMatch(/Lanewright study comparison/i);
      expect(pages).toBeGreaterThanOrEqual(2);
      expect(pages).toBeLessThanOrEqual(8);
      for (const words of [
        'Which layout should the line use',
        'Throughput against carriers',
        'Differences at each point',
        'significantly more',
        'Model assumptions',
        'common random numbers',
        'plans throughput only',
      ])
        expect(all, `the PDF should contain "${words}"`).toContain(words);
      expect(all).not.toContain('Print or save as PDF');
      expect(session.browser.pageErrors).toEqual([]);
    },
    STUDY_TIMEOUT * 4,
  );
});
