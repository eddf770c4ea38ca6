// Run by the benchmark in a fresh process: one 8-hour shift of the large line with nothing warmed,
// which is what a user waits for on a first run. Prints its measurement as one JSON line.
import { largeLine } from './large-line';
import { measure } from './measure';

const m = await measure(largeLine(), { hours: 8, warmupMinutes: 0, replications: 1, seed: 1 });
process.stdout.write(`${JSON.stringify(m)}\n`);
