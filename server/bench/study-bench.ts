// `npm run bench:study`: server-study throughput on this machine with 1 and 2 worker processes (one
// engine thread each), so the figure shows how adding worker processes scales. A fresh database with the
// demo scenarios; per round, the workers start, a study of `--jobs` one-replication jobs of `--hours`
// simulated hours is queued, and the clock runs until the last result is stored. Prints replications
// per second per round, the median of `--rounds` rounds per worker count, the scaling ratio (2 over 1)
// and the machine's load before and after (other work on the machine shows in both).
import 'reflect-metadata';
import { median, numberOption } from './bench-options';
import { execFileSync } from 'node:child_process';
import { setTimeout as sleep } from 'node:timers/promises';
import { createDataSource } from '../db/data-source';
import { StudyEntity, StudyPointEntity } from '../db/entities';
import { runMigrations } from '../db/migrate';
import { seedDemo } from '../db/seed/demo';
import { QUEUE_SCHEMA, startQueue, stopQueue } from '../queue/queue-client';
import { createDatabase, dropDatabase, ensureLocalPostgres } from '../setup/local-postgres';
import { ProjectEntity, ScenarioEntity, ScenarioRevisionEntity } from '../db/entities';
import { queueStudyRound } from '../studies/server-studies';
import { startWorkerProcess, type WorkerProcess } from '../worker/worker-process';

// Options as `--jobs=32 --hours=4 --rounds=3` (command-line flags; nothing here reads the environment).
const JOBS = numberOption('jobs', 32);
const HOURS = numberOption('hours', 4);
const ROUNDS = numberOption('rounds', 3);
const WORKER_COUNTS = [1, 2];

const load = () => execFileSync('uptime', { encoding: 'utf8' }).trim();

async function main(): Promise<void> {
  const server = await ensureLocalPostgres();
  const url = server.url('lanewright_bench_study');
  await dropDatabase(url);
  await createDatabase(url);
  const ds = createDataSource(url);
  await ds.initialize();
  await runMigrations(ds);
  await seedDemo(ds);
  const boss = await startQueue(url, { checkSeconds: 5 });
  const project = await ds.getRepository(ProjectEntity).findOneOrFail({ where: {} });
  const scenario = await ds.getRepository(ScenarioEntity).findOneOrFail({ where: { projectId: project.id } });
  const revision = await ds.getRepository(ScenarioRevisionEntity).findOneOrFail({ where: { scenarioId: scenario.id } });

  // Points of the same scenario with the same seed would repeat each other; each job its own replication.
  const queueStudy = () =>
    ds.transaction(async (manager) => {
      const study = await manager.getRepository(StudyEntity).save({
        projectId: project.id,
        revisionId: revision.id,
        name: 'Throughput bench',
        kind: 'sweep',
        settings: { hours: HOURS, warmupMinutes: 0, replications: JOBS, seed: 1 },
        commonRandomNumbers: true,
        blockSize: 1,
        reduction: null,
        axes: [],
        status: 'running',
        pointCount: 1,
        jobCount: JOBS,
        runOn: 'server',
        createdById: null,
      });
      await manager
        .getRepository(StudyPointEntity)
        .insert({ studyId: study.id, index: 0, revisionId: revision.id, label: 'As drawn', changes: [] });
      await queueStudyRound(manager, { boss, timeLimitSeconds: 3_600 }, study);
      return study.id;
    });

  const before = load();
  const rates = new Map<number, number[]>(WORKER_COUNTS.map((n) => [n, []]));
  for (let round = 1; round <= ROUNDS; round++) {
    for (const count of WORKER_COUNTS) {
      const workers: WorkerProcess[] = [];
      for (let i = 0; i < count; i++)
        workers.push(await startWorkerProcess(url, { LANEWRIGHT_QUEUE_CHECK_SECONDS: '5' }));
      const started = performance.now();
      const id = await queueStudy();
      while ((await ds.getRepository(StudyEntity).findOneByOrFail({ id })).status === 'running') await sleep(100);
      const seconds = (performance.now() - started) / 1_000;
      await Promise.all(workers.map((w) => w.stop()));
      await ds.query(`TRUNCATE ${QUEUE_SCHEMA}.job`);
      const rate = JOBS / seconds;
      rates.get(count)!.push(rate);
      console.log(
        `round ${round}, ${count} worker process(es): ${JOBS} replications of ${HOURS} h in ${seconds.toFixed(1)} s = ` +
          `${rate.toFixed(2)} replications/s (${(rate * HOURS).toFixed(0)} simulated h/s)`,
      );
    }
  }
  const after = load();
  const one = median(rates.get(1)!);
  const two = median(rates.get(2)!);
  console.log('');
  console.log(`median, 1 worker process:  ${one.toFixed(2)} replications/s`);
  console.log(`median, 2 worker processes: ${two.toFixed(2)} replications/s`);
  console.log(`scaling ratio (2 over 1): ${(two / one).toFixed(2)} (2.00 would be perfect on two free cores)`);
  console.log(`load before: ${before}`);
  console.log(`load after:  ${after}`);

  await stopQueue(boss);
  await ds.destroy();
  await dropDatabase(url);
  await server.stop();
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
