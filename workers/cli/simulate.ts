// `npm run simulate`: runs a scenario file in Node and prints the result (a table, or one JSON
// object with --json), or prints the scenario JSON Schema with --schema. Any bad input exits with
// status 2 and a message naming the flag or field path; an engine stop exits with status 3.
import { readFileSync } from 'node:fs';
import { scenarioJsonSchema } from '../../shared/scenario/scenario';
import { InvalidInputError, isSimulationStopped, runExperiment } from '../engine';
import { parseArgs, USAGE, UsageError } from './args';
import { formatTable } from './table';

function fail(status: number, message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(status);
}

function readScenario(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    const code = (e as { code?: string }).code;
    fail(2, `cannot read scenario file ${file}: ${code === 'ENOENT' ? 'no such file' : (code ?? 'unreadable')}`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    fail(2, `scenario file ${file} is not valid JSON: ${(e as Error).message}`);
  }
}

async function main(): Promise<void> {
  // A reader that stops early (`| head`) is not an error of ours.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(0);
  });
  let args;
  try {
    args = parseArgs(process.argv.slice(2));
  } catch (e) {
    if (e instanceof UsageError) fail(2, `${e.message}\n${USAGE}`);
    throw e;
  }
  if (args.kind === 'help') {
    process.stdout.write(`${USAGE}\n`);
    return;
  }
  if (args.kind === 'schema') {
    process.stdout.write(`${JSON.stringify(scenarioJsonSchema(), null, 2)}\n`);
    return;
  }
  const scenario = readScenario(args.scenario);
  try {
    const result = await runExperiment(scenario, args.settings, {
      now: () => performance.now(),
      yieldToHost: async () => undefined,
    });
    process.stdout.write(args.json ? `${JSON.stringify(result)}\n` : `${formatTable(result)}\n`);
  } catch (e) {
    if (e instanceof InvalidInputError)
      fail(2, `invalid input in ${args.scenario}:\n${e.issues.map((i) => `  ${i.path}: ${i.message}`).join('\n')}`);
    if (isSimulationStopped(e)) {
      const detail = e.gridlock.map((g) => `  carrier ${g.carrier} at ${g.at}, waiting for ${g.waitingFor}`).join('\n');
      fail(3, `simulation stopped (${e.reason}): ${e.message}${detail ? `\n${detail}` : ''}`);
    }
    throw e;
  }
}

main().catch((e: unknown) => fail(1, `internal error: ${e instanceof Error ? e.message : String(e)}`));
