// Manual control of the project's cluster, for running vitest or psql by hand:
//   npx tsx server/setup/postgres-cli.ts start [db]   start (or reuse), create db, print its DATABASE_URL
//   npx tsx server/setup/postgres-cli.ts stop         stop it, whoever started it
// `--root=<folder>` and `--port=<n>` act on the cluster of another folder (tests run private clusters).
import { createDatabase, ensureLocalPostgres, stopLocalPostgres } from './local-postgres';
import { reportFailure, SetupError } from './log';

const USAGE = 'usage: tsx server/setup/postgres-cli.ts start [database] | stop  [--root=<folder>] [--port=<n>]';

function parseArgs(argv: string[]) {
  const flags = new Map<string, string>();
  const positional: string[] = [];
  for (const arg of argv) {
    const flag = /^--(root|port)=(.+)$/.exec(arg);
    if (flag) flags.set(flag[1], flag[2]);
    else if (arg.startsWith('--')) throw new SetupError(`unknown option ${arg}\n${USAGE}`);
    else positional.push(arg);
  }
  const port = flags.has('port') ? Number(flags.get('port')) : undefined;
  if (port !== undefined && !(Number.isInteger(port) && port >= 1024 && port <= 65535))
    throw new SetupError(`--port must be a whole number from 1024 to 65535\n${USAGE}`);
  return { command: positional[0], database: positional[1] ?? 'lanewright', root: flags.get('root'), port };
}

async function main(argv: string[]): Promise<void> {
  const { command, database, root, port } = parseArgs(argv);
  if (command === 'stop') return stopLocalPostgres(root);
  if (command !== 'start') throw new SetupError(USAGE);
  const server = await ensureLocalPostgres({ root, port });
  const url = server.url(database);
  await createDatabase(url);
  console.log(`DATABASE_URL=${url}`);
}

main(process.argv.slice(2)).catch((error: unknown) => {
  reportFailure(error);
  process.exitCode = 1;
});
