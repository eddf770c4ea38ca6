// `npm start`: PostgreSQL, database, migrations, demo, client build, then the app on HOST:PORT
// (127.0.0.1:3000 unless set).
import { loadConfig } from '../config';
import { startServer } from '../index';
import { demoSignInText, portInUseHelp } from './app-settings';
import { buildClient } from './client-build';
import { say } from './log';
import { clientOutDir } from './paths';
import { demoEnabled, prepareDatabase } from './prepare-database';
import { exitOnSignals, failAndExit, onCleanup } from './shutdown';

async function main(): Promise<void> {
  exitOnSignals();
  // The server's own settings check (PORT, HOST, LANEWRIGHT_DEMO …) stops a bad environment before any work.
  const { PORT: port, HOST: host } = loadConfig();
  const dataSource = await prepareDatabase({ seed: true });
  await buildClient();
  const server = await startServer({ dataSource, port, host, clientDir: clientOutDir }).catch((error: unknown) => {
    throw portInUseHelp(error, port, `stop the other program, or choose another port: PORT=${port + 1} npm start`);
  });
  onCleanup(() => server.close());
  say(`Lanewright is running at ${server.url}`);
  say(server.mailNote);
  if (demoEnabled()) console.log(demoSignInText());
  say('press Ctrl-C to stop');
}

main().catch(failAndExit);
