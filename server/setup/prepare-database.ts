// The database steps shared by `npm start`, `npm run dev` and `npm run migrate`: PostgreSQL (local cluster,
// or DATABASE_URL), database `lanewright`, migrations, and the demo organisation unless LANEWRIGHT_DEMO=off.
import 'reflect-metadata';
import type { DataSource } from 'typeorm';
import { loadConfig } from '../config';
import { createDataSource } from '../db/data-source';
import { runMigrations } from '../db/migrate';
import { prepareQueueSchema } from '../queue/queue-client';
import { seedDemo } from '../db/seed/demo';
import { seedDemoPrices } from '../db/seed/demo-prices';
import { createDatabase, ensureLocalPostgres } from './local-postgres';
import { redactUrl, say, SetupError } from './log';
import { onCleanup } from './shutdown';

export const APP_DATABASE = 'lanewright';

export function demoEnabled(): boolean {
  return loadConfig().LANEWRIGHT_DEMO !== 'off';
}

function connectionHelp(url: string, error: unknown): SetupError {
  const code = (error as { code?: string }).code;
  const reason = error instanceof Error ? error.message : String(error);
  const hint =
    code === '3D000' ? ' Create the database first (createdb), or point DATABASE_URL at an existing one.' : '';
  return new SetupError(`could not connect to ${redactUrl(url)}: ${reason}.${hint}`);
}

/**
 * Prepares the application database; the returned data source is initialised and registered for clean-up.
 * `migrations: 'check'` (study workers) refuses a database whose schema is behind instead of migrating it,
 * so workers starting together on several machines never race to apply the same migration.
 */
export async function prepareDatabase(options: { seed: boolean; migrations?: 'apply' | 'check' }): Promise<DataSource> {
  const server = await ensureLocalPostgres();
  onCleanup(() => server.stop());
  const url = server.external ? loadConfig().DATABASE_URL! : server.url(APP_DATABASE);
  if (!server.external && (await createDatabase(url))) say(`created database ${APP_DATABASE}`);

  const dataSource = createDataSource(url);
  try {
    await dataSource.initialize();
  } catch (error) {
    throw connectionHelp(url, error);
  }
  onCleanup(async () => {
    if (dataSource.isInitialized) await dataSource.destroy();
  });

  if (options.migrations === 'check') {
    if (await dataSource.showMigrations())
      throw new SetupError(
        `the database at ${redactUrl(url)} needs migrations first: run \`npm run migrate\` (or \`npm start\`) once with the same DATABASE_URL`,
      );
    return dataSource;
  }
  const applied = await runMigrations(dataSource);
  // The job queue keeps its own schema, which pg-boss creates and migrates itself.
  await prepareQueueSchema(url);
  say(
    applied.length > 0
      ? `applied ${applied.length} migration(s): ${applied.join(', ')}`
      : 'database schema is up to date',
  );
  if (!options.seed) return dataSource;
  if (demoEnabled()) {
    await seedDemo(dataSource);
    await seedDemoPrices(dataSource);
    say('demo organisation is in place');
  } else {
    say('LANEWRIGHT_DEMO=off: the demo organisation is not seeded');
  }
  return dataSource;
}
