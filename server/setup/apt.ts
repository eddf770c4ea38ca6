// Installs a Debian package when a tool Lanewright needs is missing: as root through apt-get, otherwise it
// stops and says exactly what to install.
import { say, SetupError } from './log';
import { isRoot, runCommand } from './run-command';

export function aptInstall(packages: string[], reason: string): void {
  const list = packages.join(' ');
  if (!isRoot) {
    throw new SetupError(`${reason}. Install it once with:\n  sudo apt-get update && sudo apt-get install -y ${list}`);
  }
  say(`${reason}: running apt-get update && apt-get install -y ${list}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', ...packages]]) {
    const result = runCommand('apt-get', args, { inherit: true, env });
    if (result.status !== 0) {
      throw new SetupError(
        `apt-get ${args.join(' ')} failed (exit ${result.status}); install ${list} by hand and retry.`,
      );
    }
  }
}
