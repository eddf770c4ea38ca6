// Starts cold-shift.ts in a fresh Node process (same loader flags as this one) and reads its figure,
// together with the whole process's wall time from start to exit (module loading included).
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import type { Measurement } from './measure';

export type ColdShift = { run: Measurement; processMs: number };

export function coldShift(): ColdShift {
  const started = performance.now();
  const child = spawnSync(process.execPath, [...process.execArgv, join(import.meta.dirname, 'cold-shift.ts')], {
    encoding: 'utf8',
  });
  const processMs = performance.now() - started;
  if (child.status !== 0) throw new Error(`the cold run failed: ${child.stderr}`);
  return { run: JSON.parse(child.stdout.trim().split('\n').pop() ?? '{}') as Measurement, processMs };
}
