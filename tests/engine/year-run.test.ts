// The longest run the settings allow: every example, 8,760 h × 1 replication, through the command
// line, must finish and make parts at the rate its own 8-h runs show (inside their 95 % interval).
// The runs go to separate processes, as many at once as the machine has cores, so the test's wall
// time is the slowest example's, not the sum.
import { execFile } from 'node:child_process';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import type { RunResult } from '../../shared/results/run-result';
import { RUN_LIMITS } from '../../shared/scenario/run-settings';
import { EXAMPLES_DIR, exampleFiles } from './helpers';

const ROOT = join(__dirname, '../..');
const run = promisify(execFile);

async function simulate(file: string, hours: number, replications: number): Promise<RunResult> {
  const args = [
    '--import',
    'tsx',
    join(ROOT, 'workers/cli/simulate.ts'),
    '--scenario',
    join(EXAMPLES_DIR, file),
    '--hours',
    String(hours),
    '--replications',
    String(replications),
    '--json',
  ];
  const { stdout } = await run(process.execPath, args, { cwd: ROOT, maxBuffer: 64 * 1024 * 1024 });
  return JSON.parse(stdout) as RunResult;
}

/** Runs the jobs with at most `limit` in flight. */
async function pooled<T>(jobs: (() => Promise<T>)[], limit: number): Promise<T[]> {
  const out = new Array<T>(jobs.length);
  let next = 0;
  const lane = async () => {
    while (next < jobs.length) {
      const i = next++;
      out[i] = await jobs[i]();
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, jobs.length) }, lane));
  return out;
}

describe('a year of simulated time', () => {
  it('every example runs 8,760 h × 1 replication and agrees with its 8-h rate', async () => {
    const files = exampleFiles();
    const jobs = files.flatMap((f) => [() => simulate(f, RUN_LIMITS.hoursMax, 1), () => simulate(f, 8, 20)]);
    const results = await pooled(jobs, Math.max(1, availableParallelism()));
    files.forEach((file, i) => {
      const year = results[2 * i];
      const shift = results[2 * i + 1].throughputPerHour;
      expect(year.observedHours, file).toBe(RUN_LIMITS.hoursMax);
      expect(year.throughputPerHour.mean, file).toBeGreaterThanOrEqual(shift.ciLow);
      expect(year.throughputPerHour.mean, file).toBeLessThanOrEqual(shift.ciHigh);
    });
  }, 1_800_000);
});
