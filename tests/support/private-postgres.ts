// A throw-away PostgreSQL cluster of a test's own, in a temporary folder on a free loopback port, run
// with the project's own cluster steps (`ensureLocalPostgres({ root, port })`). Tests that stop or
// restart PostgreSQL use one, so the shared test cluster (and every test using it) never notices.
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureLocalPostgres, stopLocalPostgres } from '../../server/setup/local-postgres';
import { chooseClusterPaths } from '../../server/setup/postgres-folder';

export interface PrivatePostgres {
  url(database: string): string;
  /** Fast shutdown, a pause with the server down, and a start on the same port. */
  restart(downMs: number): Promise<void>;
  remove(): Promise<void>;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

export async function startPrivatePostgres(): Promise<PrivatePostgres> {
  const root = mkdtempSync(join(tmpdir(), 'lanewright-private-pg-'));
  const port = await freePort();
  const cluster = await ensureLocalPostgres({ root, port });
  return {
    url: (database) => cluster.url(database),
    restart: async (downMs) => {
      stopLocalPostgres(root);
      await new Promise((resolve) => setTimeout(resolve, downMs));
      await ensureLocalPostgres({ root, port });
    },
    remove: async () => {
      stopLocalPostgres(root);
      rmSync(chooseClusterPaths(root).base, { recursive: true, force: true });
      rmSync(root, { recursive: true, force: true });
    },
  };
}
