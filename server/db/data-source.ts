// The one TypeORM data source. Entities and migrations are listed as classes (no globs) and the schema is
// only ever changed by migrations, never by `synchronize`.
import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';

export function createDataSource(url: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    synchronize: false,
    migrationsRun: false,
    uuidExtension: 'pgcrypto',
    logging: false,
    extra: { max: 10 },
  });
}
