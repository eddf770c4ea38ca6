// Creates and drops databases by URL, on the local cluster or any server DATABASE_URL points to. The
// statements run from the server's maintenance database, since a database cannot drop itself.
import pg from 'pg';
import { redactUrl, SetupError } from './log';

export function databaseName(url: string): string {
  const name = decodeURIComponent(new URL(url).pathname.replace(/^\//, ''));
  if (!name)
    throw new SetupError(`the database URL ${redactUrl(url)} names no database (expected …/<name> at its end)`);
  return name;
}

/** The same server and credentials, another database. */
export function withDatabase(url: string, database: string): string {
  const parsed = new URL(url);
  parsed.pathname = `/${encodeURIComponent(database)}`;
  return parsed.toString();
}

function quoteIdentifier(name: string): string {
  return `"${name.replace(/"/g, '""')}"`;
}

async function withMaintenanceClient<T>(url: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  let lastError: unknown;
  for (const maintenance of ['postgres', 'template1']) {
    const client = new pg.Client({ connectionString: withDatabase(url, maintenance) });
    try {
      await client.connect();
    } catch (error) {
      lastError = error;
      await client.end().catch(() => undefined);
      if ((error as { code?: string }).code === '3D000') continue;
      break;
    }
    try {
      return await work(client);
    } finally {
      await client.end();
    }
  }
  throw lastError;
}

/** Creates the database named in `url` unless it exists; true when it was created. */
export async function createDatabase(url: string): Promise<boolean> {
  const name = databaseName(url);
  return withMaintenanceClient(url, async (client) => {
    const existing = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (existing.rowCount) return false;
    try {
      await client.query(`CREATE DATABASE ${quoteIdentifier(name)}`);
      return true;
    } catch (error) {
      // Another process created it between the check and the statement.
      if ((error as { code?: string }).code === '42P04') return false;
      throw error;
    }
  });
}

/** Drops the database named in `url`, closing its open connections first; no error when it is absent. */
export async function dropDatabase(url: string): Promise<void> {
  const name = databaseName(url);
  await withMaintenanceClient(url, (client) =>
    client.query(`DROP DATABASE IF EXISTS ${quoteIdentifier(name)} WITH (FORCE)`),
  );
}

/** Client connections to the server other than this query's own (any database). */
export async function otherConnections(url: string): Promise<number> {
  return withMaintenanceClient(url, async (client) => {
    const result = await client.query(
      "SELECT count(*)::int AS n FROM pg_stat_activity WHERE backend_type = 'client backend' AND pid <> pg_backend_pid()",
    );
    return result.rows[0].n as number;
  });
}
