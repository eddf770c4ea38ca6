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

/** The URL a data source made here connects to, for other clients of the same database (the job queue). */
export function databaseUrlOf(ds: DataSource): string {
  const url = (ds.options as { url?: string }).url;
  if (!url) throw new Error('this data source was not made from a URL');
  return url;
}
