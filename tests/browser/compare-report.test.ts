// The demo engineer asks "stacked or side by side?": runs both demo layouts with one seed from the
// comparison page, reads the answer with its paired interval and the invented demo prices, opens the
// printable report and prints it to PDF in Chromium; the PDF's pages and text are checked.
// Screenshots go to test-artifacts/screenshots/compare-*.png.
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { projectRoot } from '../../server/setup/paths';
import { screenshot, useAppInBrowser, type TestBrowser } from '../support/browser';
import { pdfText } from '../support/pdf-text';

const DEMO_PROJECT = 'Cartridge line layout study';
const RUN_TIMEOUT = 120_000;

const session = useAppInBrowser({ viewport: { width: 1280, height: 900 } });
let browser: TestBrowser;
let page: Page;
let reportPath = '';

beforeAll(() => {
  ({ browser, page } = session);
});

describe('comparing the stacked and side-by-side demo layouts', () => {
  it(
    'runs both layouts with one seed and answers which makes more, with its interval and costs',
    async () => {
      await session.signIn('engineer@demo.lanewright.test');
      await page.getByRole('link', { name: new RegExp(DEMO_PROJECT) }).click();
      await page.getByRole('link', { name: 'Compare layouts' }).click();
      await page.getByRole('heading', { level: 1, name: 'Compare layouts' }).waitFor();

      const form = page.getByRole('form', { name: 'Run scenarios with one seed' });
      await form.getByLabel('Replications').fill('1');
      await form.getByLabel('Hours each').fill('1');
      await form.getByRole('button', { name: 'Run and compare' }).click();
      await page.waitForURL(/compare\?runs=/, { timeout: RUN_TIMEOUT });
      // One replication is allowed but gives no interval: the answer says so rather than guess.
      await page.getByText('1 × 1 h after 30 min warm-up', { exact: false }).first().waitFor({ timeout: RUN_TIMEOUT });
      expect(await page.getByTestId('answer').textContent()).toMatch(
        /no interval: an interval needs at least two replications/,
      );

      await form.getByLabel('Seed').fill('');
      await form.getByRole('button', { name: 'Run and compare' }).click();
      await form.getByText(/seed must not be empty|seed must be a whole number or text/).waitFor();

      await form.getByLabel('Replications').fill('6');
      await form.getByLabel('Hours each').fill('2');
      await form.getByLabel('Seed').fill('7');
      await form.getByRole('button', { name: 'Run and compare' }).click();
      await page.getByText('6 × 2 h after 30 min warm-up', { exact: false }).first().waitFor({ timeout: RUN_TIMEOUT });
      await page.getByTestId('headline-table').waitFor();

      const answer = (await page.getByTestId('answer').textContent()) ?? '';
      expect(answer).toMatch(/Stacked loop|Side-by-side loop/);
      expect(answer).toMatch(/95 % paired interval/);
      expect(answer).toMatch(/Capital cost: .*EUR .* against .*EUR/);
      expect(answer).toMatch(
        /Floor area: Stacked loop 1\.6 m² against Side-by-side loop 6\.4 m²|Floor area: Side-by-side loop 6\.4 m² against Stacked loop 1\.6 m²/,
      );
      expect(await page.getByTestId('pairing-note').count()).toBe(0);
      await page.getByText('Invented demo prices').first().waitFor();
      const bill = page.getByTestId('bill-of-materials');
      await expect.poll(async () => bill.getByRole('row', { name: /Elevators/ }).textContent()).toMatch(/2 · 76,000/);
      expect(await page.getByTestId('footprint-table').getByRole('row', { name: /Decks/ }).textContent()).toMatch(
        /Decks\s*2\s*1|Decks\s*1\s*2/,
      );
      expect(await page.locator('[data-verdict]').count()).toBe(5);
      expect(browser.pageErrors).toEqual([]);
      await screenshot(page, 'compare-01-page');
    },
    RUN_TIMEOUT * 2,
  );

  it(
    'prints the report to an A4 PDF that holds the question, answer, figures, assumptions and cautions',
    async () => {
      await page.getByRole('link', { name: 'Printable report' }).click();
      await page.locator('[data-testid="report"][data-ready="yes"]').waitFor();
      await page.locator('[data-layout-drawing]').first().waitFor();
      await screenshot(page, 'compare-02-report-screen');
      await page.emulateMedia({ media: 'print' });
      await screenshot(page, 'compare-03-report-print-media');
      const pdf = await page.pdf({ format: 'A4', printBackground: false, preferCSSPageSize: true });
      await page.emulateMedia({ media: 'screen' });
      reportPath = join(projectRoot, 'test-artifacts', 'screenshots', 'compare-report.pdf');
      await writeFile(reportPath, pdf);

      const { pages, text } = await pdfText(new Uint8Array(pdf));
      const all = text.join('\n').replace(/\s+/g, ' ');
      // The whole report (question, figures, costs, footprint, two drawings, charts, notes) needs several
      // A4 pages, and a runaway layout would need dozens.
      // The kicker is printed in capitals by CSS, so the PDF holds it upper-cased.
      expect(all).toMatch(/Lanewright layout comparison/i);
      expect(pages).toBeGreaterThanOrEqual(3);
      expect(pages).toBeLessThanOrEqual(14);
      for (const words of [
        'Which layout should the line use',
        'Headline figures',
        'Throughput',
        '95 %',
        'Bill of materials',
        'Invented demo prices',
        'Footprint',
        'Line balance',
        'Model assumptions',
        'common random numbers',
        'plans throughput only',
        'local codes',
      ]) {
        expect(all, `the PDF should contain "${words}"`).toContain(words);
      }
      expect(all).not.toContain('Print or save as PDF');
      expect(all).not.toContain('Run and compare');
    },
    RUN_TIMEOUT,
  );
});
