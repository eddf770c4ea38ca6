// `npm run dev`: the database steps of `npm start`, the API on PORT, and Vite's dev server on
// 127.0.0.1:5173 (hot reload, /api proxied to the API). Server code changes need a restart.
import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { join } from 'node:path';
import { loadConfig } from '../config';
import { startServer } from '../index';
import { demoSignInText, HTTP_HOST, portInUseHelp } from './app-settings';
import { say, SetupError } from './log';
import { projectRoot } from './paths';
import { demoEnabled, prepareDatabase } from './prepare-database';
import { exitOnSignals, failAndExit, onCleanup } from './shutdown';

const VITE_PORT = 5173;

/**
 * Vite runs as its own process: in this one, its exit-on-SIGTERM handler would end the process before our
 * clean-up (HTTP server, data source, PostgreSQL) had run.
 */
function startVite(apiPort: number): void {
  const viteBin = join(projectRoot, 'node_modules', 'vite', 'bin', 'vite.js');
  const args = [viteBin, '--host', HTTP_HOST, '--port', String(VITE_PORT), '--strictPort'];
  // vite.config.ts reads PORT to point its /api proxy at the API.
  const child = spawn(process.execPath, args, {
    cwd: projectRoot,
    stdio: 'inherit',
    env: { ...process.env, PORT: String(apiPort) },
  });
  let stopping = false;
  onCleanup(async () => {
    stopping = true;
    if (child.exitCode !== null || child.signalCode !== null) return;
    child.kill('SIGTERM');
    await once(child, 'exit');
  });
  child.once('exit', (code) => {
    if (stopping) return;
    const why = new SetupError(
      `Vite's dev server stopped (exit ${code}); is port ${VITE_PORT} taken by another dev server?`,
    );
    void failAndExit(why);
  });
}

async function main(): Promise<void> {
  exitOnSignals();
  // The server's own settings check (PORT, HOST, LANEWRIGHT_DEMO …) stops a bad environment before any work.
  const { PORT: port, HOST: host } = loadConfig();
  const dataSource = await prepareDatabase({ seed: true });
  const api = await startServer({ dataSource, port, host }).catch((error: unknown) => {
    throw portInUseHelp(error, port, `stop the other program, or choose another port: PORT=${port + 1} npm run dev`);
  });
  onCleanup(() => api.close());
  say(`API listening at ${api.url}`);
  say(api.mailNote);
  startVite(port);
  say(`open http://${HTTP_HOST}:${VITE_PORT}/ (Vite dev server with hot reload; /api goes to ${api.url})`);
  if (demoEnabled()) console.log(demoSignInText());
  say('press Ctrl-C to stop');
}

main().catch(failAndExit);
