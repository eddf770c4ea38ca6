// `npm start`: PostgreSQL, database, migrations, demo, client build, then the app on HOST:PORT
// (127.0.0.1:3000 unless set) and one study worker (unless LANEWRIGHT_WORKER=off).
import { loadConfig } from '../config';
import { databaseUrlOf } from '../db/data-source';
import { startServer } from '../index';
import { startStudyWorker } from '../worker/study-worker';
import { demoSignInText, portInUseHelp } from './app-settings';
import { buildClient } from './client-build';
import { say } from './log';
import { clientOutDir } from './paths';
import { demoEnabled, prepareDatabase } from './prepare-database';
import { exitOnSignals, failAndExit, onCleanup } from './shutdown';

async function main(): Promise<void> {
  exitOnSignals();
  // The server's own settings check (PORT, HOST, LANEWRIGHT_DEMO …) stops a bad environment before any work.
  const config = loadConfig();
  const { PORT: port, HOST: host } = config;
  const dataSource = await prepareDatabase({ seed: true });
  await buildClient();
  const server = await startServer({ dataSource, port, host, clientDir: clientOutDir }).catch((error: unknown) => {
    throw portInUseHelp(error, port, `stop the other program, or choose another port: PORT=${port + 1} npm start`);
  });
  onCleanup(() => server.close());
  if (config.LANEWRIGHT_WORKER === 'on') {
    // One study worker beside the web server, so server studies run with no extra step on one machine.
    const worker = await startStudyWorker({
      ds: dataSource,
      url: databaseUrlOf(dataSource),
      threads: config.LANEWRIGHT_WORKER_THREADS,
      checkSeconds: config.LANEWRIGHT_QUEUE_CHECK_SECONDS,
    });
    onCleanup(() => worker.stop());
    say(`a study worker runs here on ${worker.threads} engine thread(s) (LANEWRIGHT_WORKER=off to run none)`);
  }
  say(`Lanewright is running at ${server.url}`);
  say(server.mailNote);
  if (demoEnabled()) console.log(demoSignInText());
  say('press Ctrl-C to stop');
}

main().catch(failAndExit);
