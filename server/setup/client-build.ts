// Builds the React client into dist/client with Vite, skipped when the build is newer than every source
// that goes into it.
import { spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { say, SetupError } from './log';
import { clientOutDir, projectRoot } from './paths';

const CLIENT_SOURCES = [
  'src',
  'index.html',
  'shared',
  'workers',
  'public',
  'vite.config.ts',
  'tailwind.config.ts',
  'package-lock.json',
];

function newestChange(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestChange(join(path, entry)));
  return newest;
}

export function clientBuildIsFresh(): boolean {
  const builtIndex = join(clientOutDir, 'index.html');
  if (!existsSync(builtIndex)) return false;
  const sourcesChanged = Math.max(...CLIENT_SOURCES.map((source) => newestChange(join(projectRoot, source))));
  return statSync(builtIndex).mtimeMs >= sourcesChanged;
}

/** Runs `vite build` unless dist/client is up to date; its output streams to this terminal. */
export async function buildClient(): Promise<void> {
  if (clientBuildIsFresh()) {
    say('client build in dist/client is up to date');
    return;
  }
  say('building the client with Vite into dist/client');
  const vite = join(projectRoot, 'node_modules', 'vite', 'bin', 'vite.js');
  const code = await new Promise<number>((resolve, reject) => {
    const child = spawn(process.execPath, [vite, 'build'], { cwd: projectRoot, stdio: 'inherit' });
    child.once('error', reject);
    child.once('exit', (exitCode, signal) => resolve(exitCode ?? (signal ? 1 : 0)));
  });
  if (code !== 0) throw new SetupError(`vite build failed (exit ${code}); see its output above.`);
}
