// Command-line flags of `npm run simulate`, parsed into a checked request or a usage error that
// names the flag. Kept apart from the entry file so it can be tested without spawning a process.
export type SimulateArgs =
  | { kind: 'schema' }
  | { kind: 'help' }
  | {
      kind: 'run';
      scenario: string;
      json: boolean;
      settings: {
        replications?: number;
        seed?: string | number;
        hours?: number;
        warmupMinutes?: number;
        carriers?: number;
      };
    };

export class UsageError extends Error {
  override readonly name = 'UsageError';
}

export const USAGE = `usage: npm run -s simulate -- --scenario FILE [--replications R] [--seed S] [--hours H]
                             [--warmup-minutes W] [--carriers N] [--json]
       npm run -s simulate -- --schema      print the scenario JSON Schema`;

const NUMERIC: Record<string, 'replications' | 'hours' | 'warmupMinutes' | 'carriers'> = {
  '--replications': 'replications',
  '--hours': 'hours',
  '--warmup-minutes': 'warmupMinutes',
  '--carriers': 'carriers',
};

export function parseArgs(argv: string[]): SimulateArgs {
  let scenario: string | undefined;
  let json = false;
  const settings: Extract<SimulateArgs, { kind: 'run' }>['settings'] = {};
  for (let i = 0; i < argv.length; i++) {
    const flag = argv[i];
    if (flag === '--schema') return { kind: 'schema' };
    if (flag === '--help' || flag === '-h') return { kind: 'help' };
    if (flag === '--json') {
      json = true;
      continue;
    }
    const value = argv[i + 1];
    const needsValue = flag === '--scenario' || flag === '--seed' || flag in NUMERIC;
    if (!needsValue) throw new UsageError(`unknown flag ${flag}`);
    if (value === undefined || value.startsWith('--')) throw new UsageError(`${flag} needs a value`);
    i++;
    if (flag === '--scenario') scenario = value;
    else if (flag === '--seed')
      settings.seed = /^\d+$/.test(value) && Number.isSafeInteger(Number(value)) ? Number(value) : value;
    else {
      const n = Number(value);
      if (value.trim() === '' || !Number.isFinite(n)) throw new UsageError(`${flag} must be a number, got "${value}"`);
      settings[NUMERIC[flag]] = n;
    }
  }
  if (scenario === undefined) throw new UsageError('--scenario FILE is required');
  return { kind: 'run', scenario, json, settings };
}
