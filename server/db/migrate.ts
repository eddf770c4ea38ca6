// Applies pending migrations, each in its own transaction, and reports which ran.
import type { DataSource } from 'typeorm';

export async function runMigrations(ds: DataSource): Promise<string[]> {
  if (!ds.isInitialized) await ds.initialize();
  const applied = await ds.runMigrations({ transaction: 'each' });
  return applied.map((migration) => migration.name);
}
