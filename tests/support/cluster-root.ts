// A throw-away folder for a private PostgreSQL cluster (tests of the set-up itself), and its removal with
// the cluster stopped first. The folder is opened to the `postgres` user, which runs the server.
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { stopLocalPostgres } from '../../server/setup/local-postgres';
import { chooseClusterPaths } from '../../server/setup/postgres-folder';

export function makeClusterRoot(label: string): string {
  const root = mkdtempSync(join(tmpdir(), `lanewright-${label}-`));
  chmodSync(root, 0o755);
  return root;
}

export function removeClusterRoot(root: string): void {
  stopLocalPostgres(root);
  rmSync(chooseClusterPaths(root).base, { recursive: true, force: true });
  rmSync(root, { recursive: true, force: true });
}
