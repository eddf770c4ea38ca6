// A throw-away PostgreSQL cluster of a test's own, on a free loopback port in a temporary folder, made
// with the project's own cluster steps. Tests that stop or restart PostgreSQL use one, so the shared test
// cluster (and every test using it) never notices.
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { initCluster, startCluster, stopCluster } from '../../server/setup/local-postgres';
import { requirePgBinaries } from '../../server/setup/postgres-binaries';
import { prepareClusterFolders } from '../../server/setup/postgres-folder';

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
  const bins = requirePgBinaries();
  // Under /var/tmp, which the `postgres` user can enter whatever the clone's own folders allow.
  const base = mkdtempSync(join('/var/tmp', 'lanewright-private-pg-'));
  const paths = { base, dataDir: join(base, 'postgres'), logFile: join(base, 'postgres.log'), fallback: true };
  prepareClusterFolders(paths);
  initCluster(bins, paths);
  const port = await freePort();
  await startCluster(bins, paths, port);
  let running = true;
  return {
    url: (database) => `postgres://postgres@127.0.0.1:${port}/${database}`,
    restart: async (downMs) => {
      stopCluster(bins, paths);
      await new Promise((resolve) => setTimeout(resolve, downMs));
      await startCluster(bins, paths, port);
    },
    remove: async () => {
      if (running) stopCluster(bins, paths);
      running = false;
      rmSync(base, { recursive: true, force: true });
    },
  };
}
