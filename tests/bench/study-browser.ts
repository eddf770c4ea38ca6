// `npm run bench:study-browser`: a carrier-sizing study of the demo scenario (its default 20 counts ×
// 10 replications × 8 h) run in headless Chromium through the study page, once with one worker and
// once with the page's full pool (one per core, capped), several times each; prints the median wall
// time of each and their ratio. Timing starts when the study page opens and ends when it says Done, so
// it includes posting every job's result to the server. A benchmark, not a test: it asserts nothing.
import { performance } from 'node:perf_hooks';
import type { Page } from 'playwright-core';
import { apiRoutes } from '../../shared/api/routes';
import { studyDetailSchema, type CreateStudyInput } from '../../shared/api/studies';
import { scenarioSchema } from '../../shared/scenario/scenario';
import { carrierSizingPoints } from '../../workers/studies/build-points';
import { carrierGrid, defaultCarrierRange } from '../../workers/studies/carrier-sizing';
import { buildClient, clientBuildIsFresh } from '../../server/setup/client-build';
import { createDatabase, ensureLocalPostgres } from '../../server/setup/local-postgres';
import { launchBrowser, startTestApp } from '../support/browser';
import { cpuBetween, readCpu } from './process-cpu';
import { BROWSER_TEST_DATABASE } from '../support/test-database';

const runsArg = process.argv.find((a) => a.startsWith('--runs='));
const RUNS = runsArg ? Math.max(1, Number(runsArg.slice(7)) || 3) : 3;
const SETTINGS = { hours: 8, warmupMinutes: 30, replications: 10, seed: 1 };

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function makeStudy(page: Page, base: string, workers: number): Promise<string> {
  const projects = (await page.evaluate((url) => fetch(url).then((r) => r.json()), `${base}${apiRoutes.projects}`)) as {
    id: string;
    name: string;
  }[];
  const project = projects.find((p) => p.name === 'Cartridge line layout study') ?? projects[0];
  const scenarios = (await page.evaluate(
    (url) => fetch(url).then((r) => r.json()),
    `${base}${apiRoutes.projectScenarios(project.id)}`,
  )) as { id: string; name: string; latestRevision: { id: string; number: number } }[];
  const scenario = scenarios.find((s) => s.name === 'Stacked loop') ?? scenarios[0];
  const revision = (await page.evaluate(
    (url) => fetch(url).then((r) => r.json()),
    `${base}${apiRoutes.scenarioRevision(scenario.id, scenario.latestRevision.number)}`,
  )) as { document: unknown };
  const range = defaultCarrierRange(scenarioSchema.parse(revision.document));
  const body: CreateStudyInput = {
    name: `Bench, ${workers} worker(s)`,
    kind: 'carrierSizing',
    revisionId: scenario.latestRevision.id,
    settings: SETTINGS,
    blockSize: SETTINGS.replications,
    points: carrierSizingPoints(carrierGrid(range.low, range.high)),
  };
  const created = await page.evaluate(
    ([url, payload]) =>
      fetch(url, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: payload }).then((r) =>
        r.json(),
      ),
    [`${base}${apiRoutes.projectStudies(project.id)}`, JSON.stringify(body)] as const,
  );
  return studyDetailSchema.parse(created).id;
}

type Timing = { seconds: number; cpu: [string, number][] };

async function timeStudy(page: Page, base: string, workers: number): Promise<Timing> {
  const id = await makeStudy(page, base, workers);
  const cpuBefore = readCpu();
  const started = performance.now();
  await page.goto(`${base}/studies/${id}?workers=${workers}`);
  await page.getByText(/Status: (Done|Done, some points failed)\./).waitFor({ timeout: 600_000 });
  const seconds = (performance.now() - started) / 1000;
  return { seconds, cpu: cpuBetween(cpuBefore, readCpu()) };
}

const cpuLine = (cpu: [string, number][]) =>
  cpu
    .filter(([, s]) => s >= 0.05)
    .map(([where, s]) => `${where} ${s.toFixed(1)}`)
    .join(', ');

async function main() {
  if (!clientBuildIsFresh()) await buildClient();
  const postgres = await ensureLocalPostgres();
  await createDatabase(postgres.url(BROWSER_TEST_DATABASE));
  const app = await startTestApp(postgres.url(BROWSER_TEST_DATABASE));
  const browser = await launchBrowser();
  try {
    const page = browser.page;
    await page.goto(`${app.url}/sign-in`);
    await page.getByLabel('E-mail').fill('engineer@demo.lanewright.test');
    await page.getByLabel('Password').fill('demo-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('link', { name: /Cartridge line layout study/ }).waitFor();
    const cores = await page.evaluate(() => navigator.hardwareConcurrency);
    const pool = Math.min(8, cores);
    const times: Record<number, number[]> = { 1: [], [pool]: [] };
    const processor: Record<number, number[]> = { 1: [], [pool]: [] };
    for (let run = 0; run < RUNS; run++) {
      for (const workers of [1, pool]) {
        const { seconds, cpu } = await timeStudy(page, app.url, workers);
        times[workers].push(seconds);
        processor[workers].push(cpu.reduce((a, [, s]) => a + s, 0));
        const total = processor[workers][run];
        console.log(`run ${run + 1}: ${workers} worker(s) ${seconds.toFixed(1)} s`);
        console.log(`  processor time ${total.toFixed(1)} s: ${cpuLine(cpu)}`);
      }
    }
    const one = median(times[1]);
    const many = median(times[pool]);
    console.log(`\nCarrier sizing of the demo (20 counts × 10 replications × 8 h), Chromium, ${cores} cores reported`);
    console.log(
      `median of ${RUNS}: 1 worker ${one.toFixed(1)} s, ${pool} workers ${many.toFixed(1)} s, speed-up ${(one / many).toFixed(2)}×`,
    );
    // With every core busy, no schedule can finish sooner than the processor time spread over the cores.
    const floor = median(processor[pool]) / cores;
    console.log(
      `processor time with ${pool} workers ${median(processor[pool]).toFixed(1)} s over ${cores} cores: ` +
        `at best ${floor.toFixed(1)} s, a speed-up of at most ${(one / floor).toFixed(2)}× on this machine`,
    );
    console.log(
      `targets: ${pool} workers under 15 s (${many < 15 ? 'met' : 'not met'}); speed-up at least 1.7× (${one / many >= 1.7 ? 'met' : 'not met'})`,
    );
  } finally {
    await browser.close();
    await app.close();
    await postgres.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
