// `npm test`: the type check and the lint (whole runs only), PostgreSQL and fresh test databases,
// Chromium, the client build the browser tests serve, then `vitest run` over every project (extra
// arguments pass through and skip the static checks). The run always ends
// with the plain line `N passed, N failed` from tests/support/plain-summary-reporter.ts, printed here after
// clean-up so that it stays the last line.
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { aptInstall } from '../server/setup/apt';
import { buildClient } from '../server/setup/client-build';
import { acquireLock } from '../server/setup/file-lock';
import { createDatabase, dropDatabase, ensureLocalPostgres, type LocalPostgres } from '../server/setup/local-postgres';
import { redactUrl, reportFailure, say } from '../server/setup/log';
import { projectRoot } from '../server/setup/paths';
import { CHROMIUM_PATH } from './support/chromium-path';
import { reportStaticChecks, startStaticChecks, type StaticCheckResult } from './support/static-checks';
import { BROWSER_TEST_DATABASE, TEST_DATABASE } from './support/test-database';

const REPORTER = './tests/support/plain-summary-reporter.ts';

function ensureChromium(): void {
  if (existsSync(CHROMIUM_PATH)) return;
  aptInstall(['chromium'], `Chromium is missing at ${CHROMIUM_PATH} (the browser tests drive it)`);
}

function hasBrowserTests(): boolean {
  const folder = join(projectRoot, 'tests', 'browser');
  return (
    existsSync(folder) && readdirSync(folder, { recursive: true }).some((file) => String(file).endsWith('.test.ts'))
  );
}

function runVitest(args: string[], env: NodeJS.ProcessEnv): Promise<number> {
  const vitest = join(projectRoot, 'node_modules', 'vitest', 'vitest.mjs');
  // Our reporter comes from vite.config.ts, unless the caller chose reporters: then add it to theirs.
  const reporterArgs = args.some((arg) => arg.startsWith('--reporter')) ? [`--reporter=${REPORTER}`] : [];
  // Piped rather than inherited: vitest then prints plain lines instead of redrawing a live summary.
  const child = spawn(process.execPath, [vitest, 'run', ...args, ...reporterArgs], {
    cwd: projectRoot,
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout.pipe(process.stdout, { end: false });
  child.stderr.pipe(process.stderr, { end: false });
  const forward = (signal: NodeJS.Signals) => child.kill(signal);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  if (interrupted) child.kill('SIGINT');
  return new Promise((resolve) => {
    child.once('error', (error) => {
      reportFailure(error);
      resolve(1);
    });
    child.once('close', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

// Ctrl-C during set-up must still reach the clean-up (stop PostgreSQL, release the lock, print the line).
let interrupted = false;
const noteInterrupt = (signal: NodeJS.Signals) => {
  interrupted = true;
  say(`${signal}: stopping after the current step`);
};
process.on('SIGINT', noteInterrupt);
process.on('SIGTERM', noteInterrupt);

async function main(): Promise<number> {
  const release = await acquireLock(join(projectRoot, '.data', 'test-run.lock'), 'another `npm test` in this clone');
  const workDir = mkdtempSync(join(tmpdir(), 'lanewright-test-'));
  const summaryFile = join(workDir, 'summary.txt');
  let server: LocalPostgres | undefined;
  let exitCode = 1;
  let setupFailures = 0;
  const args = process.argv.slice(2);
  // A filtered run is someone iterating on a few files; the whole-tree checks would double its time.
  const staticChecks: Promise<StaticCheckResult[]> = args.length === 0 ? startStaticChecks() : Promise.resolve([]);
  if (args.length > 0) say('filtered run: the type check and lint are skipped (npm run typecheck, npm run lint)');
  let staticCounts: { passed: number; failed: number } | undefined;
  try {
    server = await ensureLocalPostgres();
    const databaseUrl = server.url(TEST_DATABASE);
    const browserDatabaseUrl = server.url(BROWSER_TEST_DATABASE);
    for (const url of [databaseUrl, browserDatabaseUrl]) {
      await dropDatabase(url);
      await createDatabase(url);
    }
    say(`fresh databases ${TEST_DATABASE} and ${BROWSER_TEST_DATABASE} on ${redactUrl(server.url(''))}`);

    try {
      ensureChromium();
    } catch (error) {
      // Only the browser tests need it; they fail with their own message and the rest still run.
      reportFailure(error);
    }
    if (hasBrowserTests()) {
      try {
        await buildClient();
      } catch (error) {
        reportFailure(error);
        setupFailures += 1;
      }
    }

    const env: NodeJS.ProcessEnv = {
      ...process.env,
      DATABASE_URL: databaseUrl,
      LANEWRIGHT_BROWSER_DATABASE_URL: browserDatabaseUrl,
      NO_COLOR: '1',
      LANEWRIGHT_SUMMARY_FILE: summaryFile,
    };
    delete env.FORCE_COLOR;
    // The checks ran beside the database set-up; their lines come before vitest's output.
    staticCounts = reportStaticChecks(await staticChecks);
    if (interrupted) throw new Error('interrupted before the tests started');
    exitCode = await runVitest(args, env);
  } catch (error) {
    reportFailure(error);
    setupFailures += 1;
  } finally {
    await server?.stop().catch(reportFailure);
    release();
  }
  // A set-up failure skips vitest, not the checks already running: they still count.
  staticCounts ??= reportStaticChecks(await staticChecks);

  const vitestLine = existsSync(summaryFile) ? readFileSync(summaryFile, 'utf8').trim() : undefined;
  rmSync(workDir, { recursive: true, force: true });
  const [passed, failed, skipped] = (vitestLine?.match(/\d+/g) ?? ['0', '0', '0']).map(Number);
  // A failing exit with nothing counted (no test file matched, a config error) still counts as one failure.
  const unexplained = exitCode !== 0 && setupFailures === 0 && !failed ? 1 : 0;
  const failures = (failed ?? 0) + setupFailures + unexplained + staticCounts.failed;
  if (unexplained) {
    const why = interrupted ? 'the run was interrupted' : `vitest exited with code ${exitCode} although no test failed`;
    say(`${why}; counted as one failure`);
  }
  if (setupFailures > 0) say(`${setupFailures} set-up step(s) failed (counted as failures below)`);
  if (staticCounts.failed > 0) say(`${staticCounts.failed} static check(s) failed (counted as failures below)`);
  console.log(
    `${(passed ?? 0) + staticCounts.passed} passed, ${failures} failed${skipped ? `, ${skipped} skipped` : ''}`,
  );
  return failures > 0 ? Math.max(exitCode, 1) : exitCode;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    reportFailure(error);
    console.log('0 passed, 1 failed');
    process.exit(1);
  },
);
