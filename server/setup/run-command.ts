// Runs the system tools the set-up needs (PostgreSQL's binaries, apt-get, test). PostgreSQL refuses to run
// as root, so as root its commands go through runuser as the unprivileged `postgres` user.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';

export const SERVER_USER = 'postgres';
export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

export interface CommandResult {
  status: number;
  stdout: string;
  stderr: string;
}

export interface CommandOptions {
  /** Run as the `postgres` user when this process is root. */
  asServerUser?: boolean;
  cwd?: string;
  /** Stream the output to this process's terminal instead of capturing it. */
  inherit?: boolean;
  env?: NodeJS.ProcessEnv;
}

const runuser = existsSync('/usr/sbin/runuser') ? '/usr/sbin/runuser' : 'runuser';

export function runCommand(command: string, args: string[], options: CommandOptions = {}): CommandResult {
  const viaRunuser = options.asServerUser === true && isRoot;
  const file = viaRunuser ? runuser : command;
  const argv = viaRunuser ? ['-u', SERVER_USER, '--', command, ...args] : args;
  const result = spawnSync(file, argv, {
    cwd: options.cwd,
    env: options.env ?? process.env,
    encoding: 'utf8',
    stdio: options.inherit ? 'inherit' : ['ignore', 'pipe', 'pipe'],
  });
  if (result.error) throw result.error;
  return { status: result.status ?? 1, stdout: result.stdout ?? '', stderr: result.stderr ?? '' };
}

/** uid and gid of the `postgres` user, read from /etc/passwd (undefined when the user does not exist). */
export function serverUserIds(): { uid: number; gid: number } | undefined {
  const line = readFileSync('/etc/passwd', 'utf8')
    .split('\n')
    .find((entry) => entry.startsWith(`${SERVER_USER}:`));
  if (!line) return undefined;
  const [, , uid, gid] = line.split(':');
  return { uid: Number(uid), gid: Number(gid) };
}
