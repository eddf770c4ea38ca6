// The databases a test run uses, on the local cluster or beside the database DATABASE_URL names (never
// that database itself: tests truncate tables). vitest runs its projects side by side, so the browser tests
// get a database of their own: API tests emptying tables must not pull the demo users from under them.
import { testEnv } from './test-env';

export const TEST_DATABASE = 'lanewright_test';
export const BROWSER_TEST_DATABASE = 'lanewright_test_browser';

export function requireDatabaseUrl(): string {
  const url = testEnv().DATABASE_URL;
  if (!url) {
    throw new Error(
      'DATABASE_URL is not set. Run the tests with `npm test` (it starts PostgreSQL and sets it), or start the ' +
        'cluster yourself: `npx tsx server/setup/postgres-cli.ts start lanewright_test` and export the URL it prints.',
    );
  }
  return url;
}

/** The browser tests' database: set by `npm test`; the shared test database when vitest is run by hand. */
export function browserDatabaseUrl(): string {
  return testEnv().LANEWRIGHT_BROWSER_DATABASE_URL ?? requireDatabaseUrl();
}
