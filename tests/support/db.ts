// Database access for API tests: one migrated data source per test file on DATABASE_URL (set by
// `npm test` to the fresh `lanewright_test` database), and a way to empty every table between tests.
import 'reflect-metadata';
import type { DataSource } from 'typeorm';
import { afterAll, afterEach, beforeAll } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { runMigrations } from '../../server/db/migrate';
import { requireDatabaseUrl } from './test-database';

let opening: Promise<DataSource> | undefined;

/** The file's data source, initialised and migrated on first use (vitest gives every file its own modules). */
export function testDataSource(): Promise<DataSource> {
  opening ??= (async () => {
    const dataSource = createDataSource(requireDatabaseUrl());
    await dataSource.initialize();
    await runMigrations(dataSource);
    return dataSource;
  })();
  return opening;
}

export async function closeTestDataSource(): Promise<void> {
  if (!opening) return;
  const dataSource = await opening;
  opening = undefined;
  if (dataSource.isInitialized) await dataSource.destroy();
}

/** Empties every entity table (the migrations table stays), restarting sequences. */
export async function truncateAllTables(dataSource: DataSource): Promise<void> {
  const tables = new Set(
    dataSource.entityMetadatas
      .filter((metadata) => metadata.tableType !== 'view')
      .map((metadata) =>
        metadata.tablePath
          .split('.')
          .map((part) => `"${part.replace(/"/g, '""')}"`)
          .join('.'),
      ),
  );
  if (tables.size > 0) await dataSource.query(`TRUNCATE ${[...tables].join(', ')} RESTART IDENTITY CASCADE`);
}

/**
 * Registers the hooks most API test files want: open before the first test, empty the tables after each
 * test (unless `truncate: false`), close after the last. Returns a getter for use inside tests.
 */
export function useTestDatabase(options: { truncate?: boolean } = {}): () => DataSource {
  let current: DataSource | undefined;
  beforeAll(async () => {
    current = await testDataSource();
  });
  if (options.truncate !== false) {
    afterEach(async () => {
      if (current) await truncateAllTables(current);
    });
  }
  afterAll(closeTestDataSource);
  return () => {
    if (!current) throw new Error('useTestDatabase(): the data source is only available inside tests and hooks');
    return current;
  };
}
