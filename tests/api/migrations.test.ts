// Migrations build the whole schema on an empty database, and running them again changes nothing.
import { afterAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { runMigrations } from '../../server/db/migrate';
import { migrations } from '../../server/db/migrations';
import { createDatabase, databaseName, dropDatabase, withDatabase } from '../../server/setup/databases';
import { requireDatabaseUrl } from '../support/test-database';

const emptyUrl = withDatabase(requireDatabaseUrl(), `${databaseName(requireDatabaseUrl())}_empty_${process.pid}`);

afterAll(async () => {
  await dropDatabase(emptyUrl);
});

describe('migrations', () => {
  it('run on an empty database, then a second run applies nothing, and the schema matches the entities', async () => {
    await dropDatabase(emptyUrl);
    await createDatabase(emptyUrl);
    const ds = createDataSource(emptyUrl);
    try {
      const first = await runMigrations(ds);
      expect(first).toEqual(migrations.map((m) => m.name));
      expect(await runMigrations(ds)).toEqual([]);
      // TypeORM's own schema diff: empty when migrations and entity definitions agree.
      const pending = await ds.driver.createSchemaBuilder().log();
      expect(pending.upQueries.map((q) => q.query)).toEqual([]);
      const tables = await ds.query(
        `SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' ORDER BY table_name`,
      );
      const entityTables = ds.entityMetadatas.map((m) => m.tableName);
      expect(entityTables).toEqual(
        expect.arrayContaining([
          'users',
          'organisations',
          'memberships',
          'sessions',
          'projects',
          'scenarios',
          'scenario_revisions',
          'runs',
          'audit_entries',
        ]),
      );
      expect(tables.map((t: { table_name: string }) => t.table_name)).toEqual([...entityTables, 'migrations'].sort());
    } finally {
      if (ds.isInitialized) await ds.destroy();
    }
  });
});
