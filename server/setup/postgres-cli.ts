// Manual control of the project's cluster, for running vitest or psql by hand:
//   npx tsx server/setup/postgres-cli.ts start [db]   start (or reuse), create db, print its DATABASE_URL
//   npx tsx server/setup/postgres-cli.ts stop         stop it, whoever started it
import { createDatabase, ensureLocalPostgres, stopLocalPostgres } from './local-postgres';
import { reportFailure, SetupError } from './log';

async function main(command: string | undefined, database = 'lanewright'): Promise<void> {
  if (command === 'stop') return stopLocalPostgres();
  if (command !== 'start') throw new SetupError('usage: tsx server/setup/postgres-cli.ts start [database] | stop');
  const server = await ensureLocalPostgres();
  const url = server.url(database);
  await createDatabase(url);
  console.log(`DATABASE_URL=${url}`);
}

main(process.argv[2], process.argv[3]).catch((error: unknown) => {
  reportFailure(error);
  process.exitCode = 1;
});
