// `npm start`: PostgreSQL, database, migrations, demo, client build, then the app on 127.0.0.1:PORT.
import { startServer } from '../index';
import { demoSignInText, HTTP_HOST, httpPort, portInUseHelp } from './app-settings';
import { buildClient } from './client-build';
import { say } from './log';
import { clientOutDir } from './paths';
import { demoEnabled, prepareDatabase } from './prepare-database';
import { exitOnSignals, failAndExit, onCleanup } from './shutdown';

async function main(): Promise<void> {
  exitOnSignals();
  const port = httpPort();
  const dataSource = await prepareDatabase({ seed: true });
  await buildClient();
  const server = await startServer({ dataSource, port, host: HTTP_HOST, clientDir: clientOutDir }).catch((error: unknown) => {
    throw portInUseHelp(error, port, `stop the other program, or choose another port: PORT=${port + 1} npm start`);
  });
  onCleanup(() => server.close());
  say(`Lanewright is running at ${server.url}`);
  if (demoEnabled()) console.log(demoSignInText());
  say('press Ctrl-C to stop');
}

main().catch(failAndExit);
