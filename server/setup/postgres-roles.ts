// Puts the project's cluster in its password-protected state, idempotently, on every start: the app role
// exists, owns every application database and what is in it, and pg_hba.conf asks every TCP login for a
// scram-sha-256 password. A cluster from an older checkout (loopback trusted, everything owned by the
// superuser) is upgraded in place by the same steps; no data moves.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';
import { say, SetupError } from './log';
import { APP_ROLE, clusterUrl, credentialsPath, SUPERUSER, type ClusterCredentials } from './postgres-credentials';
import type { ClusterPaths } from './postgres-folder';

export const PASSWORD_HBA =
  '# Lanewright: loopback TCP only, a scram-sha-256 password for every role; no unix sockets.\n' +
  'host all all 127.0.0.1/32 scram-sha-256\n';

const hbaFile = (paths: ClusterPaths) => join(paths.dataDir, 'pg_hba.conf');

/** True while any rule lets a login in without a password (the state older checkouts left behind). */
export function trustsLogins(paths: ClusterPaths): boolean {
  return readFileSync(hbaFile(paths), 'utf8')
    .split('\n')
    .some((line) => !line.trimStart().startsWith('#') && /\btrust\b/.test(line));
}

export function writePasswordHba(paths: ClusterPaths): void {
  writeFileSync(hbaFile(paths), PASSWORD_HBA);
}

/**
 * Objects an older checkout's migrations made as the superuser, in the connected database: handed to the
 * app role so later migrations may change them. Extension members (pgcrypto's functions) stay put.
 */
const HAND_OVER_OBJECTS = `
DO $$
DECLARE item record;
BEGIN
  FOR item IN
    SELECT format('ALTER SCHEMA %I OWNER TO ${APP_ROLE}', nspname) AS statement FROM pg_namespace
    WHERE pg_get_userbyid(nspowner) = '${SUPERUSER}' AND nspname NOT LIKE 'pg\\_%' AND nspname <> 'information_schema'
  UNION ALL
    SELECT format('ALTER TABLE %I.%I OWNER TO ${APP_ROLE}', n.nspname, c.relname) FROM pg_class c
    JOIN pg_namespace n ON n.oid = c.relnamespace
    WHERE pg_get_userbyid(c.relowner) = '${SUPERUSER}' AND c.relkind IN ('r', 'p', 'v', 'm', 'f')
      AND n.nspname NOT LIKE 'pg\\_%' AND n.nspname <> 'information_schema'
  UNION ALL
    -- Sequences that belong to a column follow their table; the others are handed over one by one.
    SELECT format('ALTER SEQUENCE %I.%I OWNER TO ${APP_ROLE}', n.nspname, c.relname) FROM pg_class c
    JOIN pg_namespace n ON n.oid = c.relnamespace
    WHERE pg_get_userbyid(c.relowner) = '${SUPERUSER}' AND c.relkind = 'S'
      AND n.nspname NOT LIKE 'pg\\_%' AND n.nspname <> 'information_schema'
      AND NOT EXISTS (SELECT 1 FROM pg_depend d WHERE d.objid = c.oid AND d.deptype IN ('a', 'i'))
  UNION ALL
    SELECT format('ALTER ROUTINE %s OWNER TO ${APP_ROLE}', p.oid::regprocedure) FROM pg_proc p
    JOIN pg_namespace n ON n.oid = p.pronamespace
    WHERE pg_get_userbyid(p.proowner) = '${SUPERUSER}' AND n.nspname NOT LIKE 'pg\\_%' AND n.nspname <> 'information_schema'
      AND NOT EXISTS (SELECT 1 FROM pg_depend d WHERE d.objid = p.oid AND d.deptype = 'e')
  UNION ALL
    SELECT format('ALTER TYPE %I.%I OWNER TO ${APP_ROLE}', n.nspname, t.typname) FROM pg_type t
    JOIN pg_namespace n ON n.oid = t.typnamespace
    WHERE pg_get_userbyid(t.typowner) = '${SUPERUSER}' AND t.typtype IN ('e', 'd', 'r')
      AND n.nspname NOT LIKE 'pg\\_%' AND n.nspname <> 'information_schema'
      AND NOT EXISTS (SELECT 1 FROM pg_depend d WHERE d.objid = t.oid AND d.deptype = 'e')
  LOOP
    EXECUTE item.statement;
  END LOOP;
END $$`;

async function withClient<T>(url: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

function refusedHelp(paths: ClusterPaths, error: unknown): SetupError {
  const reason = error instanceof Error ? error.message : String(error);
  return new SetupError(
    `the local PostgreSQL refused the superuser password kept in ${credentialsPath(paths.base)} (${reason}). ` +
      'The file no longer matches the cluster: restore it, or delete ' +
      `${paths.base} to start with an empty cluster (its data is lost).`,
  );
}

/**
 * Creates the app role and hands it the application databases, as the superuser. Under the old trust
 * rules the superuser's password is set here first; afterwards it is what logs in. True when
 * pg_hba.conf was rewritten, so the caller has the server reload it.
 */
export async function secureCluster(
  paths: ClusterPaths,
  port: number,
  credentials: ClusterCredentials,
): Promise<boolean> {
  const upgrading = trustsLogins(paths);
  const admin = (db: string) => clusterUrl(port, db, SUPERUSER, credentials.superuserPassword);
  const movedDatabases = await withClient(admin('postgres'), async (client) => {
    const quoted = (text: string) => client.escapeLiteral(text);
    if (upgrading) await client.query(`ALTER ROLE ${SUPERUSER} PASSWORD ${quoted(credentials.superuserPassword)}`);
    const role = await client.query('SELECT 1 FROM pg_roles WHERE rolname = $1', [APP_ROLE]);
    const verb = role.rowCount ? 'ALTER' : 'CREATE';
    if (!role.rowCount || upgrading) {
      await client.query(
        `${verb} ROLE ${APP_ROLE} LOGIN CREATEDB NOSUPERUSER NOCREATEROLE PASSWORD ${quoted(credentials.password)}`,
      );
    }
    const owned = await client.query<{ datname: string }>(
      `SELECT datname FROM pg_database
       WHERE NOT datistemplate AND datname <> 'postgres' AND pg_get_userbyid(datdba) = $1`,
      [SUPERUSER],
    );
    for (const { datname } of owned.rows) {
      await client.query(`ALTER DATABASE ${client.escapeIdentifier(datname)} OWNER TO ${APP_ROLE}`);
    }
    return owned.rows.map((row) => row.datname);
  }).catch((error: unknown) => {
    if ((error as { code?: string }).code === '28P01') throw refusedHelp(paths, error);
    throw error;
  });
  for (const db of movedDatabases) await withClient(admin(db), (client) => client.query(HAND_OVER_OBJECTS));
  if (movedDatabases.length > 0) say(`handed database(s) ${movedDatabases.join(', ')} to the role ${APP_ROLE}`);
  if (!upgrading) return false;
  writePasswordHba(paths);
  say(
    `PostgreSQL now asks for a password (scram-sha-256, role ${APP_ROLE}); it is kept in ${credentialsPath(paths.base)}`,
  );
  return true;
}
