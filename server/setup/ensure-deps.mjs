// Installs the npm dependencies before anything else runs (plain Node, no packages: node_modules may not
// exist yet). `npm ci` runs when node_modules is missing or was installed from another package-lock.json;
// the lockfile's hash is kept in node_modules/.lanewright-lock-hash to tell.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const lockfile = join(root, 'package-lock.json');
const modules = join(root, 'node_modules');
const hashFile = join(modules, '.lanewright-lock-hash');
// npm's own record of what it installed, written at the end of every install.
const npmRecord = join(modules, '.package-lock.json');

function say(message) {
  console.log(`[lanewright] ${message}`);
}

function fail(message) {
  console.error(`[lanewright] ${message}`);
  // `npm test` promises a closing count line even when it cannot get as far as running the tests.
  if (process.env.npm_lifecycle_event === 'test') console.log('0 passed, 1 failed');
  process.exit(1);
}

function checkNode() {
  const [major, minor] = process.versions.node.split('.').map(Number);
  if (major < 20 || (major === 20 && minor < 19)) {
    fail(
      `Node.js ${process.versions.node} is too old: Lanewright needs 20.19 or newer (see "engines" in package.json).`,
    );
  }
}

/** Why node_modules must be (re)installed, or undefined when it matches the lockfile. */
function staleReason(lockHash) {
  if (!existsSync(modules)) return 'node_modules is missing';
  if (existsSync(hashFile) && readFileSync(hashFile, 'utf8').trim() === lockHash) return undefined;
  // Installed by a plain `npm install`/`npm ci` (no hash recorded yet, or `npm i <pkg>` changed both files):
  // npm rewrites its record after the lockfile, so a record at least as new means they agree.
  if (existsSync(npmRecord) && statSync(npmRecord).mtimeMs >= statSync(lockfile).mtimeMs - 5_000) return undefined;
  return existsSync(hashFile)
    ? 'package-lock.json changed since the last install'
    : 'node_modules was not installed from this package-lock.json';
}

checkNode();
if (!existsSync(lockfile)) fail(`package-lock.json is missing in ${root}; restore it from git before installing.`);
const lockHash = createHash('sha256').update(readFileSync(lockfile)).digest('hex');
const reason = staleReason(lockHash);
if (reason) {
  say(`${reason}: running npm ci (about half a minute)`);
  const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
  const result = spawnSync(npm, ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.error) fail(`could not run npm: ${result.error.message}`);
  if (result.status !== 0) fail(`npm ci failed (exit ${result.status}); see its output above.`);
  say('dependencies installed');
} else {
  say('dependencies match package-lock.json');
}
if (!existsSync(hashFile) || readFileSync(hashFile, 'utf8').trim() !== lockHash)
  writeFileSync(hashFile, `${lockHash}\n`);
