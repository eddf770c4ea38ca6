// `npm run dev`: the database steps of `npm start`, the API on PORT, and Vite's dev server on
// 127.0.0.1:5173 (hot reload, /api proxied to the API). Server code changes need a restart.
import { createServer } from 'vite';
import { startServer } from '../index';
import { demoSignInText, HTTP_HOST, httpPort, portInUseHelp } from './app-settings';
import { say } from './log';
import { projectRoot } from './paths';
import { demoEnabled, prepareDatabase } from './prepare-database';
import { exitOnSignals, failAndExit, onCleanup } from './shutdown';

const VITE_PORT = 5173;

async function main(): Promise<void> {
  exitOnSignals();
  const port = httpPort();
  // vite.config.ts reads PORT to point its /api proxy at the API.
  process.env.PORT = String(port);
  const dataSource = await prepareDatabase({ seed: true });
  const api = await startServer({ dataSource, port, host: HTTP_HOST }).catch((error: unknown) => {
    throw portInUseHelp(error, port, `stop the other program, or choose another port: PORT=${port + 1} npm run dev`);
  });
  onCleanup(() => api.close());
  say(`API listening at ${api.url}`);

  const vite = await createServer({ root: projectRoot, server: { host: HTTP_HOST, port: VITE_PORT, strictPort: true } });
  onCleanup(() => vite.close());
  await vite.listen().catch((error: unknown) => {
    throw portInUseHelp(error, VITE_PORT, 'stop the other Vite dev server first');
  });
  say(`open http://${HTTP_HOST}:${VITE_PORT}/ (Vite dev server with hot reload; /api goes to ${api.url})`);
  if (demoEnabled()) console.log(demoSignInText());
  say('press Ctrl-C to stop');
}

main().catch(failAndExit);
