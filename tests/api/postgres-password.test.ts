// The project's own PostgreSQL cluster asks every login for a scram-sha-256 password: the app's role and
// its password are made on first start and kept in a mode-600 file, and a cluster an older checkout left
// trusting loopback is upgraded in place on the next start without losing its data. Each test runs a
// private cluster in a folder of its own, on a free port, so the test run's cluster is never touched.
import { appendFileSync, chmodSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { ensureLocalPostgres, type LocalPostgres } from '../../server/setup/local-postgres';
import { requirePgBinaries } from '../../server/setup/postgres-binaries';
import { APP_ROLE, clusterUrl, credentialsPath, SUPERUSER } from '../../server/setup/postgres-credentials';
import { chooseClusterPaths, prepareClusterFolders } from '../../server/setup/postgres-folder';
import { runCommand } from '../../server/setup/run-command';
import { makeClusterRoot, removeClusterRoot } from '../support/cluster-root';
import { freePort } from '../support/free-port';

const roots: string[] = [];
const servers: LocalPostgres[] = [];

afterAll(async () => {
  for (const server of servers) await server.stop();
  for (const root of roots) removeClusterRoot(root);
});

function freshRoot(): string {
  const root = makeClusterRoot('pg');
  roots.push(root);
  return root;
}

/** The server's answer to a login: 'ok', or the SQLSTATE (28P01: password authentication failed). */
async function login(url: string): Promise<string> {
  const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: 10_000 });
  try {
    await client.connect();
    await client.query('SELECT 1');
    return 'ok';
  } catch (error) {
    return (error as { code?: string }).code ?? (error as Error).message;
  } finally {
    await client.end().catch(() => undefined);
  }
}

async function query<T extends pg.QueryResultRow>(url: string, sql: string): Promise<T[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query<T>(sql)).rows;
  } finally {
    await client.end();
  }
}

const mode = (file: string) => statSync(file).mode & 0o777;

describe('the project’s PostgreSQL asks for a password', () => {
  it('a new cluster keeps the app role’s password in a mode-600 file and refuses logins without it', async () => {
    const root = freshRoot();
    const port = await freePort();
    const server = await ensureLocalPostgres({ root, port });
    servers.push(server);
    const paths = chooseClusterPaths(root);
    const file = credentialsPath(paths.base);
    expect(mode(file)).toBe(0o600);
    const stored = JSON.parse(readFileSync(file, 'utf8'));
    expect(stored.role).toBe(APP_ROLE);

    const url = server.url('postgres');
    expect(new URL(url).username).toBe(APP_ROLE);
    expect(decodeURIComponent(new URL(url).password)).toBe(stored.password);
    expect(await login(url)).toBe('ok');
    // A wrong password: the server refuses (SQLSTATE 28P01 "password authentication failed"), for every role.
    expect(await login(clusterUrl(port, 'postgres', APP_ROLE, 'not the password'))).toBe('28P01');
    expect(await login(clusterUrl(port, 'postgres', SUPERUSER, 'not the password'))).toBe('28P01');
    // No password: the server answers with a SCRAM challenge the client cannot meet, so no session starts.
    for (const user of [APP_ROLE, SUPERUSER]) {
      expect(await login(`postgres://${user}@127.0.0.1:${port}/postgres`)).toMatch(/SCRAM/);
    }
    expect(readFileSync(join(paths.dataDir, 'pg_hba.conf'), 'utf8')).not.toMatch(/^host.*trust/m);

    // Only the rights it needs: no superuser, may create databases (tests make their own).
    const [role] = await query<{ rolsuper: boolean; rolcreatedb: boolean; rolcreaterole: boolean }>(
      url,
      `SELECT rolsuper, rolcreatedb, rolcreaterole FROM pg_roles WHERE rolname = '${APP_ROLE}'`,
    );
    expect(role).toEqual({ rolsuper: false, rolcreatedb: true, rolcreaterole: false });

    // A loosened file mode is put right on the next start.
    chmodSync(file, 0o644);
    servers.push(await ensureLocalPostgres({ root, port }));
    expect(mode(file)).toBe(0o600);
  });

  it('upgrades a cluster an older checkout left trusting loopback, keeping its data', async () => {
    const root = freshRoot();
    const port = await freePort();
    const bins = requirePgBinaries();
    const paths = chooseClusterPaths(root);
    prepareClusterFolders(paths);
    // The older set-up, step by step: trust on loopback, everything made by the superuser.
    const asServer = { asServerUser: true, cwd: paths.dataDir };
    const init = runCommand(
      bins.bin('initdb'),
      ['-D', paths.dataDir, '-U', SUPERUSER, '-A', 'trust', '-E', 'UTF8', '--locale=C.UTF-8'],
      asServer,
    );
    expect(init.status, init.stderr).toBe(0);
    writeFileSync(join(paths.dataDir, 'pg_hba.conf'), 'host all all 127.0.0.1/32 trust\n');
    appendFileSync(
      join(paths.dataDir, 'postgresql.conf'),
      "\nlisten_addresses = '127.0.0.1'\nunix_socket_directories = ''\n",
    );
    const pgCtl = (...args: string[]) => runCommand(bins.bin('pg_ctl'), ['-D', paths.dataDir, ...args], asServer);
    expect(pgCtl('-l', paths.logFile, '-w', '-o', `-p ${port}`, 'start').status).toBe(0);
    const trusted = (db: string) => `postgres://${SUPERUSER}@127.0.0.1:${port}/${db}`;
    await query(trusted('postgres'), 'CREATE DATABASE lanewright');
    await query(
      trusted('lanewright'),
      `CREATE TABLE kept (id serial PRIMARY KEY, label text NOT NULL);
       INSERT INTO kept (label) VALUES ('first'), ('second');
       CREATE FUNCTION kept_guard() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RETURN NEW; END $$;
       CREATE TRIGGER kept_guard BEFORE UPDATE ON kept FOR EACH ROW EXECUTE FUNCTION kept_guard();`,
    );
    expect(pgCtl('-m', 'fast', '-w', 'stop').status).toBe(0);

    const server = await ensureLocalPostgres({ root, port });
    servers.push(server);
    expect(mode(credentialsPath(paths.base))).toBe(0o600);
    expect(await login(trusted('postgres'))).not.toBe('ok');
    const url = server.url('lanewright');
    expect(await query(url, 'SELECT label FROM kept ORDER BY id')).toEqual([{ label: 'first' }, { label: 'second' }]);
    // The app role owns what the superuser made, so later migrations may change it.
    await query(url, "ALTER TABLE kept ADD COLUMN note text; INSERT INTO kept (label) VALUES ('third')");
    await query(
      url,
      'CREATE OR REPLACE FUNCTION kept_guard() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RETURN NEW; END $$',
    );
    expect(await query(url, 'SELECT count(*)::int AS n FROM kept')).toEqual([{ n: 3 }]);

    // A second start finds nothing left to do and the same password still works.
    servers.push(await ensureLocalPostgres({ root, port }));
    expect(await login(url)).toBe('ok');
  });
});
