// Browser tests: the real app (on the browser tests' own database, migrated, demo seeded, serving the built
// client from dist/client) on a free loopback port, driven by Debian's Chromium through playwright-core; screenshots go to
// test-artifacts/screenshots/.
import 'reflect-metadata';
import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { runMigrations } from '../../server/db/migrate';
import { DEMO_PASSWORD, seedDemo } from '../../server/db/seed/demo';
import { seedDemoPrices } from '../../server/db/seed/demo-prices';
import { startServer } from '../../server/index';
import type { CaughtMailbox } from '../../server/mail/mailbox';
import { clientOutDir, projectRoot } from '../../server/setup/paths';
import { CHROMIUM_PATH } from './chromium-path';
import { browserDatabaseUrl } from './test-database';
import { freePort } from './free-port';

const HOST = '127.0.0.1';
const SCREENSHOT_DIR = join(projectRoot, 'test-artifacts', 'screenshots');
const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface TestApp {
  url: string;
  /** The fake SMTP server's catch (the app's /dev/mailbox page shows the same). */
  mailbox: CaughtMailbox;
  dataSource: DataSource;
  close(): Promise<void>;
}

export interface TestBrowser {
  context: BrowserContext;
  /** The tab the browser opened with. */
  page: Page;
  /** Uncaught errors thrown by pages' scripts, for tests to assert there were none. */
  pageErrors: Error[];
  /** What pages logged as console errors (failed requests among them), for tests to assert there were none. */
  consoleErrors: string[];
  close(): Promise<void>;
}

export async function startTestApp(databaseUrl: string = browserDatabaseUrl()): Promise<TestApp> {
  if (!existsSync(join(clientOutDir, 'index.html'))) {
    throw new Error(
      `${clientOutDir} holds no client build: run the tests with \`npm test\` (it builds it) or \`npm run build\` first`,
    );
  }
  const dataSource = createDataSource(databaseUrl);
  await dataSource.initialize();
  try {
    await runMigrations(dataSource);
    // The browser tests sign in as the demo accounts, whatever LANEWRIGHT_DEMO says.
    await seedDemo(dataSource, { LANEWRIGHT_DEMO: 'on' });
    await seedDemoPrices(dataSource);
    const server = await startServer({
      dataSource,
      port: await freePort(),
      host: HOST,
      clientDir: clientOutDir,
      fakeSmtpPort: 0,
    });
    if (!server.mailbox) throw new Error('the browser tests need the fake mailbox: unset SMTP_HOST');
    return {
      url: server.url,
      mailbox: server.mailbox,
      dataSource,
      close: async () => {
        await server.close();
        await dataSource.destroy();
      },
    };
  } catch (error) {
    await dataSource.destroy();
    throw error;
  }
}

export async function launchBrowser(): Promise<TestBrowser> {
  if (!existsSync(CHROMIUM_PATH)) {
    throw new Error(
      `Chromium is not installed at ${CHROMIUM_PATH}: apt-get install -y chromium (npm test does this when run as root)`,
    );
  }
  const profileDir = await mkdtemp(join(tmpdir(), 'lanewright-chromium-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
  });
  const pageErrors: Error[] = [];
  const consoleErrors: string[] = [];
  const watch = (page: Page) => {
    page.on('pageerror', (error) => pageErrors.push(error));
    page.on('console', (message) => {
      if (message.type() === 'error') consoleErrors.push(`${message.text()} (${message.location().url})`);
    });
  };
  context.on('page', watch);
  const page = context.pages()[0] ?? (await context.newPage());
  watch(page);
  return {
    context,
    page,
    pageErrors,
    consoleErrors,
    close: async () => {
      await context.close();
      await rm(profileDir, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page PNG as test-artifacts/screenshots/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  const safeName = name.replace(/[^a-zA-Z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'screenshot';
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  const path = join(SCREENSHOT_DIR, `${safeName}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

export interface BrowserTestOptions {
  /** Runs against the app before the browser starts (fixtures through the data source or the API). */
  prepare?: (app: TestApp) => Promise<void>;
  /** The tab's size; a desktop 1280 × 800 unless given. */
  viewport?: { width: number; height: number };
}

/**
 * The usual set-up of a browser test file: the app and Chromium before the first test, both closed
 * after the last, and a sign-in through the real form.
 */
export function useAppInBrowser(options: BrowserTestOptions | BrowserTestOptions['prepare'] = {}) {
  // A bare function is the `prepare` step alone.
  const { prepare, viewport = { width: 1280, height: 800 } } =
    typeof options === 'function' ? { prepare: options } : options;
  let app: TestApp | undefined;
  let browser: TestBrowser | undefined;
  beforeAll(async () => {
    app = await startTestApp();
    await prepare?.(app);
    browser = await launchBrowser();
    await browser.page.setViewportSize(viewport);
  });
  afterAll(async () => {
    await browser?.close();
    await app?.close();
  });
  const need = <T>(value: T | undefined): T => {
    if (!value) throw new Error('useAppInBrowser(): the app and browser exist only inside tests');
    return value;
  };
  return {
    get app(): TestApp {
      return need(app);
    },
    get browser(): TestBrowser {
      return need(browser);
    },
    get page(): Page {
      return need(browser).page;
    },
    /**
     * Signs in through the sign-in form as a fresh visitor (cookies cleared) and waits until the app
     * has left the sign-in page, for `returnTo` when given.
     */
    async signIn(email: string, { password = DEMO_PASSWORD, returnTo }: { password?: string; returnTo?: string } = {}) {
      const page = need(browser).page;
      await page.context().clearCookies();
      await page.goto(`${need(app).url}/sign-in${returnTo ? `?returnTo=${encodeURIComponent(returnTo)}` : ''}`);
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password').fill(password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL((url) => url.pathname !== '/sign-in');
    },
  };
}
