// `npm run worker`: one study worker process. It connects to DATABASE_URL (or, without it, to this
// clone's local cluster), refuses a database whose migrations are behind, and pulls study jobs until
// Ctrl-C or SIGTERM; jobs in hand at that moment are retried by another worker after their time limit.
import { loadConfig } from '../config';
import { databaseUrlOf } from '../db/data-source';
import { say } from '../setup/log';
import { prepareDatabase } from '../setup/prepare-database';
import { exitOnSignals, failAndExit, onCleanup } from '../setup/shutdown';
import { startStudyWorker } from './study-worker';

async function main(): Promise<void> {
  exitOnSignals();
  const config = loadConfig();
  const ds = await prepareDatabase({ seed: false, migrations: 'check' });
  const worker = await startStudyWorker({
    ds,
    url: databaseUrlOf(ds),
    threads: config.LANEWRIGHT_WORKER_THREADS,
    checkSeconds: config.LANEWRIGHT_QUEUE_CHECK_SECONDS,
  });
  onCleanup(() => worker.stop());
  say(`study worker ${process.pid} is pulling jobs on ${worker.threads} engine thread(s); press Ctrl-C to stop`);
}

main().catch(failAndExit);
