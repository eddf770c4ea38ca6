// The database every test run uses, on the local cluster or beside the database DATABASE_URL names (never
// that database itself: tests truncate tables).
export const TEST_DATABASE = 'lanewright_test';

export function requireDatabaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) {
    throw new Error(
      'DATABASE_URL is not set. Run the tests with `npm test` (it starts PostgreSQL and sets it), or start the ' +
        'cluster yourself: `npx tsx server/setup/postgres-cli.ts start lanewright_test` and export the URL it prints.',
    );
  }
  return url;
}
