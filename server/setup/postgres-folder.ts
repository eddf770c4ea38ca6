// Chooses and prepares the folder of the project's private cluster. As root the server runs as `postgres`,
// which must be able to enter every parent folder; clones under a mode-700 home or CI folder fall back to
// a folder under /var/tmp that it can reach.
import { createHash } from 'node:crypto';
import { chmodSync, chownSync, existsSync, mkdirSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, parse } from 'node:path';
import { say, SetupError } from './log';
import { isRoot, runCommand, SERVER_USER, serverUserIds } from './run-command';

export interface ClusterPaths {
  /** Folder holding the data folder, the log and the lock. */
  base: string;
  dataDir: string;
  logFile: string;
  /** True when the project's own .data could not be used. */
  fallback: boolean;
}

function serverUserCanEnter(dir: string): boolean {
  return runCommand('test', ['-x', dir], { asServerUser: true }).status === 0;
}

/** The outermost folder on the way to `dir` that the `postgres` user cannot enter, if any. */
function firstBlockedFolder(dir: string): string | undefined {
  if (serverUserCanEnter(dir)) return undefined;
  const chain: string[] = [];
  for (let current = dir; current !== parse(current).root; current = dirname(current)) chain.unshift(current);
  return chain.find((folder) => !serverUserCanEnter(folder)) ?? dir;
}

function pathsIn(base: string, fallback: boolean): ClusterPaths {
  return { base, dataDir: join(base, 'postgres'), logFile: join(base, 'postgres.log'), fallback };
}

export function chooseClusterPaths(projectRoot: string): ClusterPaths {
  const own = pathsIn(join(projectRoot, '.data'), false);
  if (!isRoot) return own;
  if (!serverUserIds()) {
    throw new SetupError(
      `The '${SERVER_USER}' system user is missing; reinstall Debian's postgresql package (apt-get install --reinstall postgresql-common).`,
    );
  }
  const blocked = firstBlockedFolder(projectRoot);
  if (!blocked) return own;
  const tag = createHash('sha256').update(projectRoot).digest('hex').slice(0, 10);
  const fallback = pathsIn(`/var/tmp/lanewright-${tag}`, true);
  const mode = (statSync(blocked).mode & 0o777).toString(8);
  say(
    `the '${SERVER_USER}' user cannot enter ${blocked} (mode ${mode}), so the PostgreSQL cluster for this clone ` +
      `lives in ${fallback.base} instead of ${own.base}`,
  );
  return fallback;
}

/** Creates the folders and the log with the owners and modes PostgreSQL insists on. */
export function prepareClusterFolders(paths: ClusterPaths): void {
  mkdirSync(paths.base, { recursive: true, mode: 0o755 });
  mkdirSync(paths.dataDir, { recursive: true, mode: 0o700 });
  if (!existsSync(paths.logFile)) writeFileSync(paths.logFile, '');
  if (!isRoot) return;
  const ids = serverUserIds()!;
  // The base stays root's but must be enterable; the data folder and log belong to the server user.
  chmodSync(paths.base, (statSync(paths.base).mode & 0o7777) | 0o711);
  chownSync(paths.logFile, ids.uid, ids.gid);
  if (statSync(paths.dataDir).uid !== ids.uid) {
    const result = runCommand('chown', ['-R', `${ids.uid}:${ids.gid}`, paths.dataDir]);
    if (result.status !== 0)
      throw new SetupError(`could not hand ${paths.dataDir} to ${SERVER_USER}: ${result.stderr.trim()}`);
  }
  chmodSync(paths.dataDir, 0o700);
}
